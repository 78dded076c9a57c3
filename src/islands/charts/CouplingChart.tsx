import { memo } from 'react';
import type { CouplingCurve } from '../../workers/protocol';
import { axisUnit, formatFixed, formatLength, type UnitSystem } from '~/lib/format';
import { ChartFrame } from './ChartFrame';
import { CsvButton } from './CsvButton';

/** k (all primary turns) against the secondary's elevation, with the target and the design's own elevation. */
export function CouplingChart({ curve, system }: { curve: CouplingCurve; system: UnitSystem }) {
  const x = axisUnit('length', system);
  const data = curve.rows.map((r) => ({ e: r.elevation * x.factor, k: r.k }));
  const refs = [
    { x: curve.elevation * x.factor, label: `now ${formatLength(curve.elevation, system, 3)}`, color: 'var(--color-copper)' },
    ...(curve.targetK !== null ? [{ y: curve.targetK, label: `target k ${formatFixed(curve.targetK, 3)}`, color: 'var(--color-arc)' }] : []),
  ];
  return (
    <div className="space-y-2" data-testid="coupling-chart">
      <div className="flex justify-end">
        <CsvButton filename="coupling.csv" header={['secondary elevation (m)', 'k']} rows={curve.rows.map((r) => [r.elevation, r.k])} />
      </div>
      <ChartFrame
        data={data}
        xKey="e"
        xLabel={`winding bottom above primary plane (${x.unit})`}
        yLabel="coupling k"
        lines={[{ key: 'k', name: 'k', color: 'var(--color-copper)' }]}
        refs={refs}
        caption="Raising the secondary loosens the coupling; start high and lower it until racing sparks appear, then back off."
      />
    </div>
  );
}

export default memo(CouplingChart);
