import { memo } from 'react';
import type { TuningCurve } from '../../workers/protocol';
import { formatFixed } from '~/lib/format';
import { ChartFrame } from './ChartFrame';
import { CsvButton } from './CsvButton';

/** Primary + tank frequency against the tap, with the secondary's frequency with and without the streamer allowance. */
export function TuningChart({ curve }: { curve: TuningCurve }) {
  const fs = curve.secondaryFrequency / 1e3;
  const ft = curve.targetFrequency / 1e3;
  const ratio = curve.primaryTargetFrequency === undefined ? 1 : curve.primaryTargetFrequency / curve.targetFrequency;
  const fr = (curve.primaryTargetFrequency ?? curve.targetFrequency) / 1e3;
  const shifted = Math.abs(ratio - 1) > 1e-9;
  const data = curve.rows.map((r) => ({ tap: r.tap, fp: r.primaryFrequency === null ? null : r.primaryFrequency / 1e3, fs, ft, ...(shifted ? { fr } : {}) }));
  const refs = curve.tapTurns !== null ? [{ x: curve.tapTurns, label: `tap ${formatFixed(curve.tapTurns, 2)}`, color: 'var(--color-copper)' }] : [];
  // the first quarter turn resonates far above the secondary; keep the crossing readable
  const top = Math.ceil((2.5 * Math.max(fs, ft)) / 10) * 10;
  return (
    <div className="space-y-2" data-testid="tuning-chart">
      <div className="flex justify-end">
        <CsvButton
          filename="tuning.csv"
          header={['tap (turns)', 'primary frequency (Hz)', 'secondary frequency (Hz)', 'secondary frequency with streamers (Hz)']}
          rows={curve.rows.map((r) => [r.tap, r.primaryFrequency, curve.secondaryFrequency, curve.targetFrequency])}
        />
      </div>
      <ChartFrame
        data={data}
        xKey="tap"
        xLabel="tap, turns from the inner end"
        yLabel="frequency (kHz)"
        lines={[
          { key: 'fp', name: 'primary + tank', color: 'var(--color-copper)' },
          { key: 'fs', name: 'secondary, no streamers', color: 'var(--color-ink-soft)', dashed: true },
          { key: 'ft', name: 'secondary with streamer allowance', color: 'var(--color-arc)', dashed: true },
          ...(shifted ? [{ key: 'fr', name: `primary target, ${formatFixed(ratio, 2)} × the secondary`, color: 'var(--color-copper)', dashed: true }] : []),
        ]}
        refs={refs}
        yDomain={[0, top]}
        caption={
          curve.tapLow !== null && curve.tapHigh !== null
            ? `Where the copper curve crosses the ${shifted ? 'copper' : 'blue'} dashed line is the tap; search ${formatFixed(Math.min(curve.tapLow, curve.tapHigh), 2)}–${formatFixed(Math.max(curve.tapLow, curve.tapHigh), 2)} turns.`
            : shifted
              ? `Where the copper curve crosses the copper dashed line (${formatFixed(ratio, 2)} × the secondary) is the tap of the bridge-driven primary.`
              : 'Where the copper curve crosses the blue dashed line is the tap.'
        }
      />
    </div>
  );
}

export default memo(TuningChart);
