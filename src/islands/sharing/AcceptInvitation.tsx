import { useState } from 'react';
import { call } from '~/lib/library/api-call';

type Props = { token: string; designName: string };

export default function AcceptInvitation({ token, designName }: Props) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function accept() {
    setBusy(true);
    setError(null);
    const r = await call<{ designId: string }>('POST', `/api/v1/invitations/${token}/accept`);
    setBusy(false);
    if (!r.ok) return setError(r.message);
    window.location.assign(`/designs/${r.data.designId}`);
  }
  return (
    <div className="space-y-3">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={() => void accept()}>
        {busy ? 'Joining…' : `Accept and open “${designName}”`}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
    </div>
  );
}
