import { useState } from 'react';
import { failureMessage } from '~/lib/api/client';
import { useAdoptWinding, windingCsvPath, type WindingSession } from '~/lib/api/queries/winding';
import { PAUSE_REASONS } from '~/lib/winding';
import type { Result } from '~/solver';
import { FormMessage } from '~/components/ui/FormMessage';
import { ReadingsTable } from './ReadingsTable';
import { Checklist } from './Checklist';
import { clockText, durationText, frequencyText, inductanceText, mmText } from './format';

export type KeyFigures = { revision: number; loadedFrequency: number | null; inductance: number | null; tapTurns: number | null };

export const keyFigures = (revision: number, r: Result | null): KeyFigures => ({
  revision,
  loadedFrequency: r?.system?.resonantFrequency ?? null,
  inductance: r?.secondary?.inductance ?? null,
  tapTurns: r?.tuning?.tapTurns ?? null,
});

type Props = { designId: string; session: WindingSession; canWrite: boolean; current: KeyFigures };

/** A finished session: what was wound, the readings and flags, pauses, the export, adoption and the finishing checklist. */
export function FinishedSession({ designId, session, canWrite, current }: Props) {
  const adopt = useAdoptWinding(designId, session.id);
  const [after, setAfter] = useState<KeyFigures | null>(null);
  const [error, setError] = useState<string | null>(null);
  const flags = session.readings.filter((r) => r.flag);

  async function doAdopt() {
    try {
      const r = await adopt.mutateAsync(undefined);
      setAfter(keyFigures(r.design.revision, r.design.result));
      setError(null);
    } catch (e) {
      setError(failureMessage(e));
    }
  }

  return (
    <article className="cw-card space-y-3" data-testid="finished-session" data-session={session.id} aria-label={`Winding session of ${session.startedAt.slice(0, 10)}`}>
      <h3 className="text-xl">
        {session.startedAt.slice(0, 10)}: {session.woundTurns} turns over {mmText(session.windingLength)}
      </h3>
      <p className="text-sm text-ink-soft">
        {session.rpm} rpm from {clockText(session.startedAt)} to {session.finishedAt ? clockText(session.finishedAt) : '—'} UTC · planned {session.plan.turns} turns at {mmText(session.plan.pitch)} (revision {session.revision})
        {session.startedBy ? ` · wound by ${session.startedBy}` : ''}
      </p>
      {flags.length > 0 && (
        <p data-testid="finished-flags">
          The counter disagreed with the height {flags.length === 1 ? 'once' : `${flags.length} times`}: {flags.map((r) => `counter ${r.counter}, height ${r.flag!.correctedCount}`).join('; ')}. {flags[0].flag!.cause}
        </p>
      )}
      {session.pauses.length > 0 && (
        <ul className="text-sm" aria-label="Pauses">
          {session.pauses.map((p) => (
            <li key={p.id}>
              {PAUSE_REASONS[p.reason]}: {clockText(p.startedAt)}–{p.endedAt ? clockText(p.endedAt) : '—'}
              {p.endedAt ? ` (${durationText((Date.parse(p.endedAt) - Date.parse(p.startedAt)) / 1000)})` : ''}
              {p.note ? ` · ${p.note}` : ''}
            </li>
          ))}
        </ul>
      )}
      <ReadingsTable session={session} />
      <div className="flex flex-wrap items-center gap-3">
        <a className="cw-btn min-h-12 no-underline" href={windingCsvPath(designId, session.id)} download>
          Export CSV
        </a>
        {canWrite && session.adoptedRevision === null && !after && (
          <button type="button" className="cw-btn cw-btn-primary min-h-12 text-lg" onClick={doAdopt} disabled={adopt.isPending}>
            Adopt into a new revision
          </button>
        )}
        {(session.adoptedRevision !== null || after) && (
          <p data-testid="adopted">
            Adopted into <a href={`/designs/${encodeURIComponent(designId)}/history`}>revision {after?.revision ?? session.adoptedRevision}</a>.
          </p>
        )}
      </div>
      {after && (
        <table className="text-sm" data-testid="adopt-results">
          <caption className="text-left font-semibold">What the wound coil changes</caption>
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-4">Figure</th>
              <th scope="col" className="pr-4">Revision {current.revision}</th>
              <th scope="col">Revision {after.revision}</th>
            </tr>
          </thead>
          <tbody>
            <tr data-figure="loaded-frequency">
              <th scope="row" className="pr-4 text-left font-normal">Resonant frequency with topload</th>
              <td className="pr-4">{frequencyText(current.loadedFrequency)}</td>
              <td>{frequencyText(after.loadedFrequency)}</td>
            </tr>
            <tr data-figure="inductance">
              <th scope="row" className="pr-4 text-left font-normal">Secondary inductance</th>
              <td className="pr-4">{inductanceText(current.inductance)}</td>
              <td>{inductanceText(after.inductance)}</td>
            </tr>
            <tr data-figure="tap">
              <th scope="row" className="pr-4 text-left font-normal">Primary tap (turns)</th>
              <td className="pr-4">{current.tapTurns?.toFixed(2) ?? '—'}</td>
              <td>{after.tapTurns?.toFixed(2) ?? '—'}</td>
            </tr>
          </tbody>
        </table>
      )}
      <FormMessage error={error} />
      <Checklist designId={designId} session={session} canWrite={canWrite} />
    </article>
  );
}
