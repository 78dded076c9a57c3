import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useRestoreRevision } from '~/lib/api/queries/designs';

type Props = { designId: string; revision: number; latest: number };

function RestoreButton({ designId, revision, latest }: Props) {
  const restoring = useRestoreRevision(designId);
  const busy = restoring.isPending;
  const error = restoring.error ? failureMessage(restoring.error) : null;
  function restore() {
    restoring.mutate({ revision: revision, latest }, { onSuccess: (r) => window.location.assign(`/designs/${designId}/history?restored=${r.revision}`) });
  }
  return (
    <div className="space-y-2">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={restore}>
        {busy ? 'Restoring…' : `Restore revision ${revision} as revision ${latest + 1}`}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>{error}</div>
    </div>
  );
}

/** Restores an old revision as the newest one. */
export default withApi(RestoreButton);
