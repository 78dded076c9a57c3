import { useCallback, useEffect, useState, type FormEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { WINDING_FIELD_LABELS as L, type WindingReadingResponse } from '~/lib/api/contracts';
import { storeSession, useFinishWinding, usePauseWinding, useResumeWinding, type WindingSession } from '~/lib/api/queries/winding';
import { DATUM_LABELS, HEIGHT_DATUMS, PAUSE_REASONS, PAUSE_REASON_IDS, liveFigures, type HeightDatum } from '~/lib/winding';
import { FormMessage } from '~/components/ui/FormMessage';
import { TextField } from '~/components/ui/TextField';
import { ReadingsTable } from './ReadingsTable';
import { useReadingQueue } from './queue';
import { useWakeLock } from './use-wake-lock';
import { clockText, durationText, metresText, mmText, newId, typedNumber } from './format';

function useNow(ms: number): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = window.setInterval(() => setNow(Date.now()), ms);
    return () => window.clearInterval(t);
  }, [ms]);
  return now;
}

function Figure({ label, value, testId, warn }: { label: string; value: string; testId: string; warn?: boolean }) {
  return (
    <div className="rounded-lg border border-rule bg-panel p-3">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className={`text-3xl font-semibold tabular-nums sm:text-4xl ${warn ? 'text-fault' : ''}`} data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}

const nowIso = () => new Date(Date.now()).toISOString();

/** The session under way: live figures, readings (kept on the device when the connection drops), pauses and the finish. */
export function LiveSession({ designId, session }: { designId: string; session: WindingSession }) {
  const qc = useQueryClient();
  const now = useNow(1000);
  const wake = useWakeLock(true);
  const onStored = useCallback((r: WindingReadingResponse) => storeSession(qc, designId, r.session), [qc, designId]);
  const queue = useReadingQueue(designId, session.id, onStored);
  const pause = usePauseWinding(designId, session.id);
  const resume = useResumeWinding(designId, session.id);
  const finish = useFinishWinding(designId, session.id);

  const [counter, setCounter] = useState('');
  const [height, setHeight] = useState('');
  const [datum, setDatum] = useState<HeightDatum>('form-end');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ error?: string | null; success?: string | null }>({});
  const [woundTurns, setWoundTurns] = useState('');
  const [windingLength, setWindingLength] = useState('');
  const [finishErrors, setFinishErrors] = useState<Record<string, string>>({});
  const [finishError, setFinishError] = useState<string | null>(null);

  const spans = session.pauses.map((p) => ({ startedAt: Date.parse(p.startedAt), endedAt: p.endedAt ? Date.parse(p.endedAt) : null }));
  const f = liveFigures(session.plan, { rpm: session.rpm, spoolLength: session.spoolLength, startedAt: Date.parse(session.startedAt), pauses: spans }, now);
  const paused = session.status === 'paused';
  const openPause = session.pauses.find((p) => p.endedAt === null);
  const lastHeight = [...session.readings].reverse().find((r) => r.estimatedTurns !== null);
  const flag = lastHeight?.flag ?? null;

  async function record(e: FormEvent) {
    e.preventDefault();
    const c = typedNumber(counter);
    const h = typedNumber(height);
    const local: Record<string, string> = {};
    if (c === null || Number.isNaN(c) || !Number.isInteger(c) || c < 0) local.counter = `${L.counter}: type the whole number the counter shows.`;
    if (Number.isNaN(h) || (h !== null && h <= 0)) local.height = `${L.height}: type a length in millimetres above 0, or leave it empty.`;
    setErrors(local);
    if (Object.keys(local).length) return;
    const outcome = await queue.record({ id: newId(), at: nowIso(), counter: c!, height: h === null ? null : h / 1000, datum: h === null ? null : datum });
    if (outcome.kind === 'refused') {
      setErrors(outcome.failure.byPath);
      setMessage({ error: outcome.failure.issues[0]?.message ?? outcome.failure.message });
      return;
    }
    setCounter('');
    setHeight('');
    setMessage(
      outcome.kind === 'stored'
        ? { success: `Reading ${c} stored.` }
        : { success: `No connection: reading ${c} is kept on this device and will be sent when the connection returns.` },
    );
  }

  async function doPause(reason: (typeof PAUSE_REASON_IDS)[number]) {
    try {
      await pause.mutateAsync({ id: newId(), reason, at: nowIso() });
      setMessage({});
    } catch (err) {
      setMessage({ error: failureMessage(err) });
    }
  }

  async function doResume() {
    try {
      await resume.mutateAsync({ at: nowIso() });
      setMessage({});
    } catch (err) {
      setMessage({ error: failureMessage(err) });
    }
  }

  async function doFinish(e: FormEvent) {
    e.preventDefault();
    const n = typedNumber(woundTurns || String(session.bestTurns ?? ''));
    const len = typedNumber(windingLength);
    const local: Record<string, string> = {};
    if (n === null || Number.isNaN(n) || !Number.isInteger(n) || n < 1) local.woundTurns = `${L.woundTurns}: type the whole number of turns on the form.`;
    if (len === null || Number.isNaN(len) || len <= 0) local.windingLength = `${L.windingLength}: type the length from the first turn to the last in millimetres.`;
    setFinishErrors(local);
    if (Object.keys(local).length) return;
    if (queue.pending.length) {
      setFinishError('Some readings are still waiting for the connection; finish once they are sent.');
      return;
    }
    try {
      await finish.mutateAsync({ at: nowIso(), woundTurns: n!, windingLength: len! / 1000 });
      setFinishError(null);
    } catch (err) {
      if (err instanceof ApiFailure) setFinishErrors(err.byPath);
      setFinishError(failureMessage(err));
    }
  }

  return (
    <section className="space-y-6" aria-label="Winding under way" data-testid="live-session" data-status={session.status}>
      <p className="text-sm text-ink-soft">
        Started {clockText(session.startedAt)} UTC at {session.rpm} rpm · {session.plan.turns} turns planned at {mmText(session.plan.pitch)} pitch ·{' '}
        <span data-testid="wake-lock">{wake === 'on' ? 'screen kept awake' : wake === 'unsupported' ? 'this browser cannot keep the screen awake; set the display timeout long' : 'screen may sleep'}</span>
      </p>
      <dl className="grid grid-cols-2 gap-3 lg:grid-cols-3">
        <Figure label="Winding time (pauses left out)" value={durationText(f.elapsed)} testId="fig-elapsed" />
        <Figure label="Expected turns" value={Math.floor(f.expectedTurns).toString()} testId="fig-turns" />
        <Figure label="Expected height from the first turn" value={mmText(f.expectedHeight)} testId="fig-height" />
        <Figure label="Wire used" value={metresText(f.wireUsed)} testId="fig-wire-used" />
        <Figure label="Wire left on the spool" value={f.wireLeft === null ? 'not given' : metresText(f.wireLeft)} testId="fig-wire-left" warn={f.spoolShort === true} />
        <Figure label="Time to finish" value={durationText(f.timeToFinish)} testId="fig-time-left" />
      </dl>
      {f.spoolShort && <p className="cw-alert">The spool holds less wire than the winding needs ({metresText(session.plan.wireLength)}): plan a splice or a second spool.</p>}

      {paused ? (
        <div className="cw-card space-y-3" data-testid="paused">
          <p className="text-2xl font-semibold">Paused: {openPause ? PAUSE_REASONS[openPause.reason] : ''}</p>
          <p className="text-sm text-ink-soft">since {openPause ? clockText(openPause.startedAt) : ''} UTC; the winding time stands still.</p>
          <button type="button" className="cw-btn cw-btn-primary min-h-16 w-full text-2xl" onClick={doResume} disabled={resume.isPending}>
            Resume winding
          </button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-3" role="group" aria-label="Pause">
          {PAUSE_REASON_IDS.map((r) => (
            <button key={r} type="button" className="cw-btn min-h-14 flex-1 text-lg" onClick={() => doPause(r)} disabled={pause.isPending}>
              Pause: {PAUSE_REASONS[r].toLowerCase()}
            </button>
          ))}
        </div>
      )}

      <form onSubmit={record} className="cw-card space-y-4" aria-label="Record a reading" noValidate>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label={L.counter} inputMode="numeric" autoComplete="off" value={counter} onChange={(e) => setCounter(e.target.value)} error={errors.counter} className="[&_input]:min-h-14 [&_input]:text-3xl" />
          <TextField label={`${L.height} (mm)`} inputMode="decimal" autoComplete="off" value={height} onChange={(e) => setHeight(e.target.value)} error={errors.height} hint="When you can: the top of the winding." className="[&_input]:min-h-14 [&_input]:text-3xl" />
        </div>
        <fieldset>
          <legend className="cw-label">{L.datum}</legend>
          <div className="flex flex-wrap gap-3">
            {HEIGHT_DATUMS.map((d) => (
              <label key={d} className={`flex min-h-12 items-center gap-2 rounded-lg border px-4 text-lg ${datum === d ? 'border-copper' : 'border-rule'}`}>
                <input type="radio" name="datum" className="h-6 w-6" checked={datum === d} onChange={() => setDatum(d)} />
                {DATUM_LABELS[d]}
              </label>
            ))}
          </div>
          {errors.datum && <p className="cw-field-error">{errors.datum}</p>}
        </fieldset>
        <button type="submit" className="cw-btn cw-btn-primary min-h-16 w-full text-2xl">
          Record reading
        </button>
        <FormMessage error={message.error} success={message.success} />
        {queue.pending.length > 0 && (
          <p className="rounded-lg border border-caution-edge bg-caution-bg p-3 text-caution-ink" data-testid="pending-readings">
            {queue.pending.length === 1 ? '1 reading is' : `${queue.pending.length} readings are`} waiting for the connection (kept on this device): {queue.pending.map((p) => p.counter).join(', ')}.
          </p>
        )}
      </form>

      {flag && lastHeight && (
        <div className="rounded-lg border border-l-4 border-fault bg-panel p-4" data-testid="count-flag" role="status">
          <p className="text-2xl font-semibold text-fault">
            Counter {lastHeight.counter}, but the height holds {lastHeight.estimatedTurns!.toFixed(0)} ± {lastHeight.tolerance!.toFixed(0)} turns
          </p>
          <p className="mt-1 text-3xl font-semibold" data-testid="corrected-count">
            Corrected count: {flag.correctedCount}
          </p>
          <p className="mt-2">{flag.cause}</p>
          <p className="mt-1">{flag.advice}</p>
          <p className="mt-1 text-sm text-ink-soft">Tolerance: {session.tolerance}.</p>
        </div>
      )}
      {!flag && lastHeight && (
        <p className="text-sm text-ink-soft" data-testid="count-agrees">
          Counter {lastHeight.counter} agrees with the height ({lastHeight.estimatedTurns!.toFixed(0)} ± {lastHeight.tolerance!.toFixed(0)} turns). Tolerance: {session.tolerance}.
        </p>
      )}

      <ReadingsTable session={session} />

      <form onSubmit={doFinish} className="cw-card space-y-4" aria-label="Finish the session" noValidate>
        <h3 className="text-xl">Finish</h3>
        <p className="text-sm text-ink-soft">The turns wound and the measured winding length go into the bench log; you can then adopt them into a new revision.</p>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label={L.woundTurns} inputMode="numeric" value={woundTurns} placeholder={session.bestTurns === null ? '' : String(session.bestTurns)} onChange={(e) => setWoundTurns(e.target.value)} error={finishErrors.woundTurns} hint={session.bestTurns === null ? undefined : `Best count so far: ${session.bestTurns}.`} />
          <TextField label={`${L.windingLength} (mm)`} inputMode="decimal" value={windingLength} onChange={(e) => setWindingLength(e.target.value)} error={finishErrors.windingLength} hint="From the first turn to the last." />
        </div>
        <button type="submit" className="cw-btn min-h-14 text-xl" disabled={finish.isPending}>
          Finish session
        </button>
        <FormMessage error={finishError} />
      </form>
    </section>
  );
}
