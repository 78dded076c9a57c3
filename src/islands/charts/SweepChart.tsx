import { memo } from 'react';
import { formatSignificant, scaledAxisUnit, type DisplayKind, type UnitSystem } from '~/lib/format';
import type { Band } from './ChartFrame';
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
  /** indexes of the rows whose design the form's own checks refuse */
  invalid?: readonly number[];
  /** why the first of them is refused, in the form's words */
  invalidReason?: string | null;
};

/** Neighbouring refused points as shaded stretches of the x axis, half a step wide either side. */
function invalidBands(xs: ReadonlyArray<number | null>, invalid: readonly number[]): Band[] {
  const set = new Set(invalid);
  const bands: Band[] = [];
  const step = xs.length > 1 && xs[0] !== null && xs[1] !== null ? Math.abs((xs[1] as number) - (xs[0] as number)) / 2 : 0;
  for (let i = 0; i < xs.length; i++) {
    if (!set.has(i) || xs[i] === null) continue;
    let j = i;
    while (set.has(j + 1) && xs[j + 1] !== null) j++;
    const a = xs[i] as number;
    const b = xs[j] as number;
    bands.push({ x1: Math.min(a, b) - step, x2: Math.max(a, b) + step, label: 'not buildable' });
    i = j;
  }
  return bands;
}

const COLORS = ['var(--color-copper)', 'var(--color-arc)', 'var(--color-sound)', 'var(--color-ink-soft)'];

/** One small chart per chosen quantity against the swept input (the quantities differ in unit). */
export function SweepChart({ rows, xName, xKind, xSiUnit, series, system, filename, invalid = [], invalidReason = null }: Props) {
  const x = scaledAxisUnit(xKind, system, rows.map((r) => r.x));
  const xLabel = x.unit ? `${xName} (${x.unit})` : xName;
  const bands = invalidBands(rows.map((r) => (r.x === null ? null : r.x * x.factor)), invalid);
  const refused = invalid.map((i) => rows[i]?.x).filter((v): v is number => typeof v === 'number');
  return (
    <div className="space-y-4" data-testid="sweep-chart">
      {refused.length > 0 && (
        <p className="cw-alert text-sm" data-testid="sweep-unbuildable" role="status">
          {refused.length} of {rows.length} points are not buildable and are left out, shaded and marked “not buildable” on each chart
          {refused.length > 0 ? ` (${xName} ${formatSignificant(Math.min(...refused) * x.factor, 4)}–${formatSignificant(Math.max(...refused) * x.factor, 4)}${x.unit ? ` ${x.unit}` : ''})` : ''}
          {invalidReason ? <>: {invalidReason}</> : '.'}
        </p>
      )}
      <div className="flex justify-end">
        <CsvButton
          filename={filename}
          header={[`${xName} (${xSiUnit || '1'})`, ...series.map((s) => `${s.name} (${s.siUnit || '1'})`)]}
          rows={rows.map((r) => [r.x, ...series.map((s) => r[s.key])])}
        />
      </div>
      {series.map((s, i) => {
        const y = scaledAxisUnit(s.kind, system, rows.map((r) => r[s.key]));
        const data = rows.map((r) => ({ x: r.x === null ? null : r.x * x.factor, y: r[s.key] === null ? null : (r[s.key] as number) * y.factor }));
        return (
          <ChartFrame
            key={s.key}
            testId={`sweep-${s.key}`}
            eager
            data={data}
            xKey="x"
            xLabel={xLabel}
            yLabel={y.unit ? `${s.name} (${y.unit})` : s.name}
            lines={[{ key: 'y', name: s.name, color: COLORS[i % COLORS.length] }]}
            dots={rows.length <= 80}
            bands={bands}
            title={`Sweep: ${s.name} against ${xName}`}
            height={220}
          />
        );
      })}
    </div>
  );
}

export default memo(SweepChart);
