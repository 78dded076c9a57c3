import { useState, type FormEvent } from 'react';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import {
  useCreateShare,
  useInvitations,
  useInvite,
  useMembers,
  useRemoveMember,
  useRevokeShare,
  useSetMemberRole,
  useShares,
  useTransferOwnership,
  useWithdrawInvitation,
  type Person,
} from '~/lib/api/queries/sharing';
import { FormMessage } from '~/components/ui/FormMessage';
import { Dialog } from '../library/Dialog';
import { copyText } from './copy-text';

type Props = {
  designId: string;
  designName: string;
  myUserId: string;
  isOwner: boolean;
  verified: boolean;
};

const roleName = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer' } as const;

/** People on a design, invitations and share links; the owner manages them, everyone else sees who is on it. */
function PeoplePanel({ designId, designName, myUserId, isOwner, verified }: Props) {
  const members = useMembers(designId);
  const invitationList = useInvitations(designId, isOwner);
  const shareList = useShares(designId, isOwner);
  const people = members.data ?? [];
  const shares = shareList.data ?? [];
  const invitations = invitationList.data ?? [];
  const [actionError, setError] = useState<string | null>(null);
  const error = actionError ?? (members.error ? failureMessage(members.error) : null);
  const [status, setStatus] = useState<string | null>(null);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<'editor' | 'viewer'>('viewer');
  const [emailError, setEmailError] = useState<string | null>(null);
  const [heir, setHeir] = useState<Person | null>(null);
  const setMemberRole = useSetMemberRole(designId);
  const removeMember = useRemoveMember(designId);
  const transfer = useTransferOwnership(designId);
  const invite = useInvite(designId);
  const withdraw = useWithdrawInvitation(designId);
  const createShare = useCreateShare(designId);
  const revokeShare = useRevokeShare(designId);
  const busy = [setMemberRole, removeMember, transfer, invite, withdraw, createShare, revokeShare].some((m) => m.isPending);

  async function act<T>(run: () => Promise<T>, done: string, after?: (data: T) => void) {
    setError(null);
    setStatus(null);
    try {
      const data = await run();
      setStatus(done);
      after?.(data);
      return true;
    } catch (e) {
      setError(failureMessage(e));
      return false;
    }
  }

  async function onInvite(e: FormEvent) {
    e.preventDefault();
    const addr = email.trim();
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(addr)) return setEmailError('Enter a valid e-mail address.');
    setEmailError(null);
    setError(null);
    setStatus(null);
    try {
      await invite.mutateAsync({ email: addr, role });
    } catch (err) {
      const field = err instanceof ApiFailure ? err.byPath.email : undefined;
      if (field) setEmailError(field);
      else setError(failureMessage(err));
      return;
    }
    setEmail('');
    setStatus(`Invitation sent to ${addr}.`);
  }

  async function copyLink(url: string) {
    const ok = await copyText(url);
    setError(ok ? null : 'Your browser did not allow copying; select the link and copy it by hand.');
    setStatus(ok ? 'Link copied.' : null);
  }

  return (
    <div className="space-y-8">
      <FormMessage error={error} success={status} />

      <section aria-labelledby="people-title">
        <h2 id="people-title" className="text-xl">People</h2>
        <div className="mt-3 overflow-x-auto rounded-lg border border-rule bg-panel">
          <table className="w-full min-w-[36rem] border-collapse text-left" data-testid="people-table">
            <caption className="sr-only">People with a role on {designName}</caption>
            <thead className="border-b border-rule text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2 font-medium">Name</th>
                <th scope="col" className="px-3 py-2 font-medium">Role</th>
                <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {people.map((p) => (
                <tr key={p.userId} className="border-b border-rule last:border-b-0" data-user-id={p.userId}>
                  <td className="px-3 py-2">
                    <span className="font-medium">{p.name || '—'}</span>
                    {p.userId === myUserId && <span className="ml-1 text-sm text-ink-soft">(you)</span>}
                    {p.email && <span className="block text-sm break-all text-ink-soft">{p.email}</span>}
                  </td>
                  <td className="px-3 py-2">
                    {isOwner && p.role !== 'owner' ? (
                      <select
                        className="cw-input min-h-9 w-auto py-1"
                        aria-label={`Role of ${p.name}`}
                        value={p.role}
                        disabled={busy}
                        onChange={(e) => void act(() => setMemberRole.mutateAsync({ userId: p.userId, role: e.target.value as 'editor' | 'viewer' }), `${p.name} is now ${e.target.value === 'editor' ? 'an editor' : 'a viewer'}.`)}
                      >
                        <option value="editor">Editor (can save)</option>
                        <option value="viewer">Viewer (reads only)</option>
                      </select>
                    ) : (
                      roleName[p.role]
                    )}
                  </td>
                  <td className="px-3 py-2">
                    <div className="flex justify-end gap-1">
                      {isOwner && p.role !== 'owner' && (
                        <>
                          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => setHeir(p)}>
                            Make owner<span className="sr-only"> {p.name}</span>
                          </button>
                          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => removeMember.mutateAsync(p.userId), `${p.name} was removed.`)}>
                            Remove<span className="sr-only"> {p.name}</span>
                          </button>
                        </>
                      )}
                      {!isOwner && p.userId === myUserId && p.role !== 'owner' && (
                        <button
                          type="button"
                          className="cw-btn cw-btn-quiet cw-btn-small"
                          disabled={busy}
                          onClick={() => void act(() => removeMember.mutateAsync(p.userId), 'You left the design.', () => window.location.assign('/designs'))}
                        >
                          Leave this design
                        </button>
                      )}
                    </div>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      {isOwner && (
        <section aria-labelledby="invite-title">
          <h2 id="invite-title" className="text-xl">Invite by e-mail</h2>
          {!verified && (
            <p className="cw-alert mt-3">
              Confirm your e-mail address first (see <a href="/account">Account</a>); then you can invite collaborators.
            </p>
          )}
          <form onSubmit={(e) => void onInvite(e)} className="mt-3 flex flex-wrap items-end gap-3" noValidate>
            <div className="min-w-60 flex-1">
              <label htmlFor="invite-email" className="cw-label">E-mail address</label>
              <input
                id="invite-email"
                type="email"
                className="cw-input"
                value={email}
                onChange={(e) => setEmail(e.target.value)}
                aria-invalid={emailError ? true : undefined}
                aria-describedby={emailError ? 'invite-email-error' : 'invite-email-hint'}
                disabled={!verified}
                autoComplete="off"
              />
              {emailError ? (
                <p id="invite-email-error" className="cw-field-error">{emailError}</p>
              ) : (
                <p id="invite-email-hint" className="cw-hint">They get a link; without an account they can make one on the way.</p>
              )}
            </div>
            <div>
              <label htmlFor="invite-role" className="cw-label">Role</label>
              <select id="invite-role" className="cw-input" value={role} onChange={(e) => setRole(e.target.value as 'editor' | 'viewer')} disabled={!verified}>
                <option value="viewer">Viewer (reads only)</option>
                <option value="editor">Editor (can save)</option>
              </select>
            </div>
            <button type="submit" className="cw-btn cw-btn-primary" disabled={busy || !verified}>Send invitation</button>
          </form>
          {invitations.length > 0 && (
            <ul className="mt-4 space-y-2" aria-label="Open invitations">
              {invitations.map((i) => (
                <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-rule bg-panel px-3 py-2">
                  <span>
                    {i.email} as {i.role}
                    {i.expired && <span className="ml-1 text-sm text-fault">(expired)</span>}
                  </span>
                  <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => withdraw.mutateAsync(i.id), `Invitation to ${i.email} withdrawn.`)}>
                    Withdraw<span className="sr-only"> invitation to {i.email}</span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </section>
      )}

      {isOwner && (
        <section aria-labelledby="links-title">
          <h2 id="links-title" className="text-xl">Read-only links</h2>
          <p className="mt-1 max-w-2xl text-ink-soft">Anyone with a link can read the design, its results and drawing without signing in, and nobody can change it through the link. Revoke a link to end it.</p>
          <button type="button" className="cw-btn cw-btn-primary mt-3" disabled={busy} onClick={() => void act(() => createShare.mutateAsync(), 'New read-only link made.', (s) => void copyText(s.url))}>
            Make a read-only link
          </button>
          <ul className="mt-4 space-y-2" aria-label="Live links">
            {shares.map((s) => (
              <li key={s.token} className="flex flex-wrap items-center gap-2 rounded-lg border border-rule bg-panel px-3 py-2" data-share-url={s.url}>
                <input className="cw-input min-w-0 flex-1 font-mono text-sm" readOnly value={s.url} aria-label="Share link" onFocus={(e) => e.currentTarget.select()} />
                <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => void copyLink(s.url)}>Copy</button>
                <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => revokeShare.mutateAsync(s.token), 'Link revoked; it no longer opens the design.')}>
                  Revoke
                </button>
              </li>
            ))}
            {shares.length === 0 && <li className="text-ink-soft">No live links.</li>}
          </ul>
        </section>
      )}

      <Dialog open={heir !== null} title="Hand over ownership?" onClose={() => setHeir(null)}>
        <p>
          {heir?.name} becomes the owner of “{designName}”: they can delete it, share it and manage people. You stay on as an editor.
        </p>
        <div className="mt-4 flex justify-end gap-2">
          <button type="button" className="cw-btn cw-btn-quiet" onClick={() => setHeir(null)} autoFocus>Cancel</button>
          <button
            type="button"
            className="cw-btn cw-btn-primary"
            onClick={() => {
              const h = heir;
              setHeir(null);
              if (h) void act(() => transfer.mutateAsync(h.userId), `${h.name} now owns the design.`, () => window.location.reload());
            }}
          >
            Hand over
          </button>
        </div>
      </Dialog>
    </div>
  );
}

export default withApi(PeoplePanel);
