import { LocalDate } from '~/components/LocalDate';
import { useState } from 'react';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useRestoreRevision } from '~/lib/api/queries/designs';
import { formatSi, formatTurns } from '~/lib/format';

export type RevisionRow = {
  revision: number;
  createdAt: string;
  author: string;
  name: string;
  message: string | null;
  loadedFrequency: number | null;
  tapTurns: number | null;
};

type Props = { designId: string; latest: number; canWrite: boolean; revisions: RevisionRow[] };

function when(iso: string) {
  return <LocalDate iso={iso} withTime />;
}

/** Every revision, newest first; pick two to compare, open one read-only, or restore one as a new revision. */
function HistoryTable({ designId, latest, canWrite, revisions }: Props) {
  const [from, setFrom] = useState(revisions[1]?.revision ?? revisions[0]?.revision ?? 1);
  const [to, setTo] = useState(revisions[0]?.revision ?? 1);
  const restoring = useRestoreRevision(designId);
  const busy = restoring.isPending;
  const error = restoring.error ? failureMessage(restoring.error) : null;

  function restore(n: number) {
    restoring.mutate({ revision: n, latest }, { onSuccess: (r) => window.location.assign(`/designs/${designId}/history?restored=${r.revision}`) });
  }

  return (
    <div className="space-y-4">
      <form action={`/designs/${designId}/compare`} method="get" className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="cmp-from" className="cw-label">Compare revision</label>
          <select id="cmp-from" name="from" className="cw-input" value={from} onChange={(e) => setFrom(Number(e.target.value))}>
            {revisions.map((r) => (
              <option key={r.revision} value={r.revision}>{r.revision}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="cmp-to" className="cw-label">with revision</label>
          <select id="cmp-to" name="to" className="cw-input" value={to} onChange={(e) => setTo(Number(e.target.value))}>
            {revisions.map((r) => (
              <option key={r.revision} value={r.revision}>{r.revision}</option>
            ))}
          </select>
        </div>
        <button type="submit" className="cw-btn cw-btn-primary" disabled={from === to}>
          Compare side by side
        </button>
      </form>
      <div role="alert" className={error ? 'cw-alert' : undefined}>{error}</div>
      <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
        <table className="w-full min-w-[48rem] border-collapse text-left">
          <caption className="sr-only">Revisions, newest first</caption>
          <thead className="border-b border-rule text-sm text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">Revision</th>
              <th scope="col" className="px-3 py-2 font-medium">Saved</th>
              <th scope="col" className="px-3 py-2 font-medium">By</th>
              <th scope="col" className="px-3 py-2 font-medium">Message</th>
              <th scope="col" className="px-3 py-2 font-medium">Loaded frequency</th>
              <th scope="col" className="px-3 py-2 font-medium">Tap</th>
              <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {revisions.map((r) => (
              <tr key={r.revision} className="border-b border-rule last:border-b-0" data-revision={r.revision}>
                <td className="px-3 py-2 font-medium">
                  {r.revision}
                  {r.revision === latest && <span className="ml-1 text-sm font-normal text-ink-soft">(latest)</span>}
                </td>
                <td className="px-3 py-2">{when(r.createdAt)}</td>
                <td className="px-3 py-2">{r.author}</td>
                <td className="px-3 py-2">{r.message ?? <span className="text-ink-soft">—</span>}</td>
                <td className="px-3 py-2 tabular-nums">{formatSi(r.loadedFrequency, 'Hz', 3)}</td>
                <td className="px-3 py-2 tabular-nums">{formatTurns(r.tapTurns)}</td>
                <td className="px-3 py-2">
                  <div className="flex justify-end gap-1">
                    <a className="cw-btn cw-btn-quiet cw-btn-small" href={`/designs/${designId}/revisions/${r.revision}`}>
                      Open<span className="sr-only"> revision {r.revision}</span>
                    </a>
                    {canWrite && r.revision !== latest && (
                      <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => restore(r.revision)}>
                        Restore<span className="sr-only"> revision {r.revision}</span>
                      </button>
                    )}
                  </div>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** Every revision, newest first; pick two to compare, open one read-only, or restore one as a new revision. */
export default withApi(HistoryTable);
