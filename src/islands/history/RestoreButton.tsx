import { useState } from 'react';
import { call } from '~/lib/library/api-call';

type Props = { designId: string; revision: number; latest: number };

export default function RestoreButton({ designId, revision, latest }: Props) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function restore() {
    setBusy(true);
    setError(null);
    const r = await call<{ revision: number }>('POST', `/api/v1/designs/${designId}/revisions/${revision}/restore`, { revision: latest });
    setBusy(false);
    if (!r.ok) return setError(r.status === 409 ? 'Someone saved a newer revision meanwhile; reload the page and try again.' : r.message);
    window.location.assign(`/designs/${designId}/history?restored=${r.data.revision}`);
  }
  return (
    <div className="space-y-2">
      <button type="button" className="cw-btn cw-btn-primary" disabled={busy} aria-busy={busy} onClick={() => void restore()}>
        {busy ? 'Restoring…' : `Restore revision ${revision} as revision ${latest + 1}`}
      </button>
      <div role="alert" className={error ? 'cw-alert' : undefined}>{error}</div>
    </div>
  );
}
