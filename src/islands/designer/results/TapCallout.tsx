import type { DesignSI, Result } from '~/solver';
import { formatFixed, formatQuantity as q } from '~/lib/format';
import { useContext } from 'react';
import type { Calibration } from '~/lib/buildsheet/calibration';
import { CalibratedTuningContext } from './calibrated-tuning';

type Props = { result: Result; calibration?: Calibration | null; design?: DesignSI | null };

/**
 * The one number to set on the bench: where to put the tap, and how far either side to search. Once a
 * measured frequency or tank capacitance is adopted on the bench, the calibrated tap is the answer and the
 * prediction stands beside it.
 */
export function TapCallout({ result: r, calibration, design }: Props) {
  const calibratedTuning = useContext(CalibratedTuningContext);
  const t = r.tuning;
  const band = r.uncertainty?.loadedFrequency;
  const taps = r.uncertainty?.tapTurns;
  const aim = t ? (t.primaryTargetFrequency ?? t.targetFrequency) : 0;
  const ratio = t && t.targetFrequency > 0 ? aim / t.targetFrequency : 1;
  const below = Math.abs(ratio - 1) > 1e-9 ? <> ({formatFixed(ratio, 2)} × the secondary&apos;s {q(t!.targetFrequency, 'frequency')})</> : null;
  if (!t) {
    return (
      <section className="rounded-xl border-2 border-dashed border-rule p-4 text-sm text-ink-soft" aria-label="Tap">
        Add a primary and a tank capacitor to get the tap to set on the bench.
      </section>
    );
  }
  const cal = calibration && design && calibratedTuning ? calibratedTuning(design, r, calibration) : null;
  if (cal) {
    return (
      <section className="rounded-xl border-2 border-copper bg-panel p-4" aria-labelledby="tap-title" data-testid="tap-callout" data-calibrated="true">
        <h3 id="tap-title" className="text-sm font-semibold uppercase tracking-wide text-copper">
          Set the tap at (from your measurement)
        </h3>
        {cal.tapTurns !== null ? (
          <p className="mt-1 text-4xl font-bold tabular-nums" data-result="tap">
            {formatFixed(cal.tapTurns, 2)} <span className="text-xl font-semibold">turns</span>
          </p>
        ) : (
          <p className="mt-1 text-lg font-semibold text-fault" data-result="tap">
            The primary cannot reach {q(cal.targetFrequency, 'frequency')} with this tank capacitor.
          </p>
        )}
        <p className="mt-1 text-sm">counted from the inner end of the primary, to tune it to {q(cal.targetFrequency, 'frequency')} from the values adopted on the bench.</p>
        <p className="mt-2 text-sm text-ink-soft" data-result="tap-predicted">
          Predicted before measuring: {t.tapTurns === null ? 'out of reach' : `${formatFixed(t.tapTurns, 2)} turns`} for {q(t.targetFrequency, 'frequency')}.
        </p>
      </section>
    );
  }
  const streamer = r.system ? t.targetFrequency !== r.system.resonantFrequency : false;
  return (
    <section className="rounded-xl border-2 border-copper bg-panel p-4" aria-labelledby="tap-title" data-testid="tap-callout">
      <h3 id="tap-title" className="text-sm font-semibold uppercase tracking-wide text-copper">
        Set the tap at
      </h3>
      {t.tapTurns !== null ? (
        <>
          <p className="mt-1 text-4xl font-bold tabular-nums" data-result="tap">
            {formatFixed(t.tapTurns, 2)} <span className="text-xl font-semibold">turns</span>
          </p>
          <p className="mt-1 text-sm">counted from the inner end of the primary, to tune it to {q(aim, 'frequency')}{below}.</p>
          {taps && taps.low !== null && taps.high !== null && (
            <p className="mt-2 text-sm" data-result="tap-range">
              Search from <strong>{formatFixed(Math.min(taps.low, taps.high), 2)}</strong> to <strong>{formatFixed(Math.max(taps.low, taps.high), 2)}</strong> turns at low power
              {band ? (
                <>
                  , since the {streamer ? 'streamer-loaded resonance' : 'secondary'} is likely to land between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}
                </>
              ) : null}
              .
            </p>
          )}
        </>
      ) : (
        <p className="mt-1 text-lg font-semibold text-fault" data-result="tap">
          The primary cannot reach {q(aim, 'frequency')} with this tank capacitor; see the primary's notes.
        </p>
      )}
    </section>
  );
}
