import { memo, useDeferredValue } from 'react';
import type { DesignSI, Result } from '~/solver';
import type { Calibration } from '~/lib/buildsheet/calibration';
import { lengthsInSystem, type UnitSystem } from '~/lib/format';
import { fieldLabel, plainMessage } from '~/lib/design/labels';
import { CoilDrawing } from '../drawing/CoilDrawing';
import { fieldId } from './form/field-context';
import { ResultsPanel } from './results/ResultsPanel';
import type { LiveState } from './use-live-solve';

type Props = {
  live: LiveState;
  pending: boolean;
  shown: { design: DesignSI; result: Result } | null;
  system: UnitSystem;
  onRetry: () => void;
  calibration?: Calibration | null;
};

/** The live results beside the form: solve state, what the results wait for, the drawing and the figures. */
export const ResultsAside = memo(function ResultsAside({ live, pending, shown, system, onRetry, calibration }: Props) {
  // the figures update first; the drawing follows in a render of its own
  const sketch = useDeferredValue(shown);
  const issues = live.status === 'invalid' ? live.issues : [];
  return (
    <aside aria-labelledby="results-title" className="space-y-4">
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="results-title" className="text-xl font-semibold">
          Results
        </h2>
        <span className="text-xs text-ink-soft" aria-live="polite" data-testid="solve-state" data-solve-ms={live.status === 'ok' ? live.ms.toFixed(2) : undefined}>
          {live.status === 'invalid' ? 'waiting for valid input' : pending ? 'updating…' : live.status === 'ok' ? 'up to date' : live.status === 'failed' ? 'stopped' : ''}
        </span>
      </div>
      {live.status === 'failed' && !pending && (
        <div className="cw-alert text-sm" role="alert" data-testid="solve-failed">
          <p>
            <span className="font-semibold">The results could not be computed.</span> {live.message}
          </p>
          <p className="mt-1">Nothing you typed is lost. Try again; if it keeps failing, reload the page.</p>
          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small mt-2" onClick={onRetry}>
            Retry
          </button>
        </div>
      )}
      {issues.length > 0 && (
        <div className="cw-alert text-sm" role="status">
          <p className="font-semibold">Results wait for {issues.length === 1 ? 'one field' : `${issues.length} fields`}:</p>
          <ul className="mt-1 list-disc pl-5">
            {issues.slice(0, 6).map((i) => (
              <li key={`${i.path}-${i.message}`}>
                <a href={`#${fieldId(i.path)}`}>{fieldLabel(i.path)}</a>: {lengthsInSystem(plainMessage(i.message), system)}
              </li>
            ))}
          </ul>
        </div>
      )}
      {shown ? (
        <>
          <section className="cw-card" aria-labelledby="drawing-title">
            <h3 id="drawing-title" className="mb-2 text-base font-semibold">
              Side section
            </h3>
            <CoilDrawing design={(sketch ?? shown).design} result={(sketch ?? shown).result} system={system} />
          </section>
          <ResultsPanel result={shown.result} system={system} stale={live.status !== 'ok'} calibration={calibration} design={shown.design} />
        </>
      ) : (
        <p className="text-sm text-ink-soft">Computing…</p>
      )}
    </aside>
  );
});
