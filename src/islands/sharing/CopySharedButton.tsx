import { useState } from 'react';
import { call } from '~/lib/library/api-call';

type Props = { token: string; signedIn: boolean; next: string };

/** Copies a shared design into the visitor's library, or asks them to sign in first. */
export default function CopySharedButton({ token, signedIn, next }: Props) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (!signedIn) {
    return (
      <p className="text-sm">
        <a href={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</a> or{' '}
        <a href={`/sign-up?next=${encodeURIComponent(next)}`}>create an account</a> to copy this design into your own library.
      </p>
    );
  }
  async function copy() {
    setBusy(true);
    setError(null);
    const r = await call<{ id: string }>('POST', `/api/v1/shared/${token}/copy`);
    setBusy(false);
    if (!r.ok) return setError(r.message);
    window.location.assign(`/designs/${r.data.id}`);
  }
  return (
    <div className="space-y-2">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={() => void copy()}>
        {busy ? 'Copying…' : 'Copy into my designs'}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
    </div>
  );
}
