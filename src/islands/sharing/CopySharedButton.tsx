import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useCopySharedDesign } from '~/lib/api/queries/designs';

type Props = { token: string; signedIn: boolean; next: string };

/** Copies a shared design into the visitor's library, or asks them to sign in first. */
function CopySharedButton({ token, signedIn, next }: Props) {
  const copying = useCopySharedDesign();
  const busy = copying.isPending;
  const error = copying.error ? failureMessage(copying.error) : null;
  if (!signedIn) {
    return (
      <p className="text-sm">
        <a href={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</a> or{' '}
        <a href={`/sign-up?next=${encodeURIComponent(next)}`}>create an account</a> to copy this design into your own library.
      </p>
    );
  }
  function copy() {
    copying.mutate(token, { onSuccess: (r) => window.location.assign(`/designs/${r.id}`) });
  }
  return (
    <div className="space-y-2">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={copy}>
        {busy ? 'Copying…' : 'Copy into my designs'}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
    </div>
  );
}

export default withApi(CopySharedButton);
