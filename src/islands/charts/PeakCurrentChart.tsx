import { memo } from 'react';
import type { BurstCurve } from '../../workers/protocol';
import { formatQuantity } from '~/lib/format';
import { ChartFrame, type RefLine } from './ChartFrame';
import { CsvButton } from './CsvButton';

/** The peak primary current each on-time up to the design's would reach, with the trip and the switch rating. */
export function PeakCurrentChart({ curve }: { curve: BurstCurve }) {
  const data = curve.peaks.map((p) => ({ onTime: p.onTime * 1e6, peak: p.peak }));
  const refs: RefLine[] = [];
  if (curve.currentLimit !== null) refs.push({ y: curve.currentLimit, label: `trip ${formatQuantity(curve.currentLimit, 'current', { digits: 3 })}`, color: 'var(--color-arc)' });
  if (curve.switchPeakCurrent !== null) refs.push({ y: curve.switchPeakCurrent, label: `switch rating ${formatQuantity(curve.switchPeakCurrent, 'current', { digits: 3 })}`, color: 'var(--color-copper)' });
  return (
    <div className="space-y-2" data-testid="peak-current-chart">
      <div className="flex justify-end">
        <CsvButton filename="peak-current-against-on-time.csv" header={['on-time (s)', 'peak primary current (A)']} rows={curve.peaks.map((p) => [p.onTime, p.peak])} />
      </div>
      <ChartFrame
        data={data}
        xKey="onTime"
        xLabel="on-time (µs)"
        yLabel="peak primary current (A)"
        lines={[{ key: 'peak', name: 'peak primary current', color: 'var(--color-copper)' }]}
        refs={refs}
        yDomain={[0, 'auto']}
        caption="Each point is the largest primary current reached by that on-time in the same burst; the current keeps growing with the on-time until losses or the trip stop it."
      />
    </div>
  );
}

export default memo(PeakCurrentChart);
