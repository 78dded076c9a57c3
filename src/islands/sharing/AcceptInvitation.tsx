import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useAcceptInvitation } from '~/lib/api/queries/sharing';

type Props = { token: string; designName: string };

function AcceptInvitation({ token, designName }: Props) {
  const join = useAcceptInvitation();
  const busy = join.isPending;
  const error = join.error ? failureMessage(join.error) : null;
  function accept() {
    join.mutate(token, { onSuccess: (r) => window.location.assign(`/designs/${r.designId}`) });
  }
  return (
    <div className="space-y-3">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={accept}>
        {busy ? 'Joining…' : `Accept and open “${designName}”`}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
    </div>
  );
}

export default withApi(AcceptInvitation);
