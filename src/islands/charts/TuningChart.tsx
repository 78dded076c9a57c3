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
  // zoom to where the curves cross: a few turns either side of the search range, and the frequencies around it
  const taps = curve.rows.map((r) => r.tap);
  const first = Math.min(...taps);
  const last = Math.max(...taps);
  const lo = curve.tapLow !== null && curve.tapHigh !== null ? Math.min(curve.tapLow, curve.tapHigh) : curve.tapTurns;
  const hi = curve.tapLow !== null && curve.tapHigh !== null ? Math.max(curve.tapLow, curve.tapHigh) : curve.tapTurns;
  const xDomain: [number, number] | undefined =
    lo !== null && hi !== null ? [Math.max(first, Math.floor(lo - Math.max(1.5, 0.25 * (hi - lo)))), Math.min(last, Math.ceil(hi + Math.max(1.5, 0.25 * (hi - lo))))] : undefined;
  const inView = data.filter((r) => !xDomain || (r.tap >= xDomain[0] && r.tap <= xDomain[1]));
  const fpInView = inView.map((r) => r.fp).filter((v): v is number => v !== null);
  const bottom = Math.floor(Math.min(fs, ft, ...fpInView.filter((v) => v > 0.5 * ft)) * 0.95);
  const top = Math.ceil(Math.max(fs, ft) * 1.25);
  const lines = [
    { key: 'fp', name: 'primary + tank', color: 'var(--color-copper)' },
    { key: 'fs', name: 'secondary, no streamers', color: 'var(--color-ink-soft)', dotted: true },
    { key: 'ft', name: 'secondary with streamer allowance', color: 'var(--color-arc)', dashed: true },
    ...(shifted ? [{ key: 'fr', name: `primary target, ${formatFixed(ratio, 2)} × the secondary`, color: 'var(--color-copper)', dashed: true }] : []),
  ];
  // a bridge-driven primary is tuned below the secondary: its tap is where it meets its own target line
  const where = shifted
    ? `Where the solid “primary + tank” curve meets the dashed “primary target, ${formatFixed(ratio, 2)} × the secondary” line (the marked tap) is the tap of the bridge-driven primary`
    : 'Where the solid “primary + tank” curve meets the dashed “secondary with streamer allowance” line (the marked tap) is the tap';
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
        lines={lines}
        refs={refs}
        yDomain={[bottom, top]}
        xDomain={xDomain}
        title="Tuning: primary + tank frequency against the tap, with the secondary's frequency"
        caption={
          curve.tapLow !== null && curve.tapHigh !== null
            ? `${where}; search ${formatFixed(Math.min(curve.tapLow, curve.tapHigh), 2)}–${formatFixed(Math.max(curve.tapLow, curve.tapHigh), 2)} turns.`
            : `${where}.`
        }
      />
    </div>
  );
}

export default memo(TuningChart);
