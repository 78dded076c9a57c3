import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useAcceptGroupInvitation } from '~/lib/api/queries/groups';

type Props = { token: string; groupName: string };

function AcceptGroupInvitation({ token, groupName }: Props) {
  const join = useAcceptGroupInvitation();
  const busy = join.isPending;
  const error = join.error ? failureMessage(join.error) : null;
  return (
    <div className="space-y-3">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={() => join.mutate(token, { onSuccess: () => window.location.assign('/groups') })}>
        {busy ? 'Joining…' : `Join “${groupName}”`}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
    </div>
  );
}

export default withApi(AcceptGroupInvitation);
