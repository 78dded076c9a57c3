import { memo } from 'react';
import type { ExchangeCurve } from '../../workers/protocol';
import { formatPercent, formatQuantity } from '~/lib/format';
import { ChartFrame } from './ChartFrame';
import { CsvButton } from './CsvButton';

/** Energy sloshing between the tuned primary and secondary (lossless), the first primary minimum marked. */
export function ExchangeChart({ curve }: { curve: ExchangeCurve }) {
  const data = curve.rows.map((r) => ({ t: r.t * 1e6, primary: r.primary, secondary: r.secondary }));
  const refs =
    curve.firstPrimaryMinimum !== null
      ? [{ x: curve.firstPrimaryMinimum * 1e6, label: `first minimum ${formatQuantity(curve.firstPrimaryMinimum, 'time', { digits: 3 })}`, color: 'var(--color-arc)' }]
      : [];
  return (
    <div className="space-y-2" data-testid="exchange-chart">
      <div className="flex justify-end">
        <CsvButton
          filename="energy-exchange.csv"
          header={['time (s)', 'primary energy (fraction of initial)', 'secondary energy (fraction of initial)']}
          rows={curve.rows.map((r) => [r.t, r.primary, r.secondary])}
        />
      </div>
      <ChartFrame
        data={data}
        xKey="t"
        xLabel="time (µs)"
        yLabel="energy (fraction of initial)"
        lines={[
          { key: 'primary', name: 'primary', color: 'var(--color-copper)' },
          { key: 'secondary', name: 'secondary', color: 'var(--color-arc)' },
        ]}
        refs={refs}
        yDomain={[0, 1]}
        caption={
          curve.firstPrimaryMinimum !== null && curve.residualPrimaryEnergy !== null
            ? `Lossless model at k = ${curve.k.toFixed(3)}: at the first minimum the primary still holds ${formatPercent(curve.residualPrimaryEnergy)} of its energy. A gap that quenches there keeps the energy in the secondary.`
            : `Lossless model at k = ${curve.k.toFixed(3)}.`
        }
      />
    </div>
  );
}

export default memo(ExchangeChart);
