import type { Result } from '~/solver';
import { formatFixed, formatQuantity as q } from '~/lib/format';

/** The one number to set on the bench: where to put the tap, and how far either side to search. */
export function TapCallout({ result: r }: { result: Result }) {
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
                  , since the secondary is likely to land between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}
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
