import { memo } from 'react';
import type { BurstCurve } from '../../workers/protocol';
import { formatQuantity } from '~/lib/format';
import { ChartFrame, type RefLine } from './ChartFrame';
import { CsvButton } from './CsvButton';

/** Primary current and secondary top voltage through one burst, from rest to the end of the on-time. */
export function BurstChart({ curve }: { curve: BurstCurve }) {
  const data = curve.rows.map((r) => ({ t: r.t * 1e6, current: r.current, voltage: r.voltage / 1000 }));
  const trip: RefLine[] =
    curve.timeToCurrentLimit !== null
      ? [{ x: curve.timeToCurrentLimit * 1e6, label: `limit reached ${formatQuantity(curve.timeToCurrentLimit, 'time', { digits: 3 })}`, color: 'var(--color-fault, #b42318)' }]
      : [];
  return (
    <div className="space-y-2" data-testid="burst-chart">
      <div className="flex justify-end">
        <CsvButton
          filename="burst.csv"
          header={['time (s)', 'primary current (A)', 'secondary top voltage (V)']}
          rows={curve.rows.map((r) => [r.t, r.current, r.voltage])}
        />
      </div>
      <ChartFrame
        data={data}
        xKey="t"
        xLabel="time (µs)"
        yLabel="primary current (A)"
        lines={[{ key: 'current', name: 'primary current', color: 'var(--color-copper)' }]}
        refs={trip}
        height={220}
        testId="burst-current"
      />
      <ChartFrame
        data={data}
        xKey="t"
        xLabel="time (µs)"
        yLabel="secondary top (kV)"
        lines={[{ key: 'voltage', name: 'secondary top voltage', color: 'var(--color-arc)' }]}
        refs={trip}
        height={220}
        testId="burst-voltage"
        caption={`The bridge switches at each zero crossing of the primary current; the secondary is unloaded (no streamer loss), so its voltage is an upper bound. Peak primary current ${formatQuantity(curve.peakPrimaryCurrent, 'current', { digits: 3 })}.`}
      />
    </div>
  );
}

export default memo(BurstChart);
