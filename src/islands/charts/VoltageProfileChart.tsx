import { memo } from 'react';
import { axisUnit, type UnitSystem } from '~/lib/format';
import { ChartFrame } from './ChartFrame';
import { CsvButton } from './CsvButton';

type Props = { profile: ReadonlyArray<{ height: number; voltage: number }>; system: UnitSystem };

/** The first mode's voltage along the winding, from the grounded base (0) to the top (1). */
export function VoltageProfileChart({ profile, system }: Props) {
  const { unit, factor } = axisUnit('length', system);
  const data = profile.map((p) => ({ height: p.height * factor, voltage: p.voltage, linear: null as number | null }));
  if (data.length > 1) {
    const h0 = data[0].height;
    const h1 = data[data.length - 1].height;
    for (const d of data) d.linear = (d.height - h0) / (h1 - h0);
  }
  return (
    <div className="space-y-2" data-testid="voltage-profile-chart">
      <div className="flex justify-end">
        <CsvButton
          filename="voltage-profile.csv"
          header={['height above the primary plane (m)', 'voltage (top = 1)']}
          rows={profile.map((p) => [p.height, p.voltage])}
        />
      </div>
      <ChartFrame
        data={data}
        xKey="height"
        xLabel={`height above the primary plane (${unit})`}
        yLabel="voltage, top = 1"
        lines={[
          { key: 'voltage', name: 'first mode', color: 'var(--color-arc)' },
          { key: 'linear', name: 'straight line, for comparison', color: 'var(--color-ink-soft)', dashed: true },
        ]}
        yDomain={[0, 1]}
        caption="The voltage rises faster than a straight line near the top: the topload and the upper turns carry most of the stored energy."
      />
    </div>
  );
}

export default memo(VoltageProfileChart);
