import { memo } from 'react';
import { axisUnit, type DisplayKind, type UnitSystem } from '~/lib/format';
import { ChartFrame } from './ChartFrame';
import { CsvButton } from './CsvButton';

export interface SweepSeriesSpec {
  key: string;
  name: string;
  kind: DisplayKind;
  /** SI unit for the CSV header */
  siUnit: string;
}

type Props = {
  rows: ReadonlyArray<Record<string, number | null>>;
  xName: string;
  xKind: DisplayKind;
  xSiUnit: string;
  series: SweepSeriesSpec[];
  system: UnitSystem;
  filename: string;
};

const COLORS = ['var(--color-copper)', 'var(--color-arc)', 'var(--color-sound)', 'var(--color-ink-soft)'];

/** One small chart per chosen quantity against the swept input (the quantities differ in unit). */
export function SweepChart({ rows, xName, xKind, xSiUnit, series, system, filename }: Props) {
  const x = axisUnit(xKind, system);
  const xLabel = x.unit ? `${xName} (${x.unit})` : xName;
  return (
    <div className="space-y-4" data-testid="sweep-chart">
      <div className="flex justify-end">
        <CsvButton
          filename={filename}
          header={[`${xName} (${xSiUnit || '1'})`, ...series.map((s) => `${s.name} (${s.siUnit || '1'})`)]}
          rows={rows.map((r) => [r.x, ...series.map((s) => r[s.key])])}
        />
      </div>
      {series.map((s, i) => {
        const y = axisUnit(s.kind, system);
        const data = rows.map((r) => ({ x: r.x === null ? null : r.x * x.factor, y: r[s.key] === null ? null : (r[s.key] as number) * y.factor }));
        return (
          <ChartFrame
            key={s.key}
            testId={`sweep-${s.key}`}
            data={data}
            xKey="x"
            xLabel={xLabel}
            yLabel={y.unit ? `${s.name} (${y.unit})` : s.name}
            lines={[{ key: 'y', name: s.name, color: COLORS[i % COLORS.length] }]}
            dots={rows.length <= 80}
            height={220}
          />
        );
      })}
    </div>
  );
}

export default memo(SweepChart);
