import { useState, type FormEvent } from 'react';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import {
  useCreateGroup,
  useDeleteGroup,
  useGroup,
  useGroupInvitations,
  useGroups,
  useInviteToGroup,
  useRemoveFromGroup,
  useSetGroupRole,
  useTransferGroup,
  useWithdrawGroupInvitation,
  type GroupInviteRole,
} from '~/lib/api/queries/groups';
import type { GroupRole } from '~/lib/api/contracts';
import { FormMessage } from '~/components/ui/FormMessage';

type Props = { myUserId: string; verified: boolean };

const roleName: Record<GroupRole, string> = { admin: 'Admin', supervisor: 'Supervisor', member: 'Member' };
const roleHelp: Record<GroupRole, string> = {
  admin: 'manages the group; edits its designs',
  supervisor: 'edits the group’s designs and signs them off for first light',
  member: 'edits the group’s designs',
};

/** My groups: make one, and for the chosen group its members, their roles, invitations, leaving and handing on the admin role. */
function GroupsPanel({ myUserId, verified }: Props) {
  const groups = useGroups();
  const list = groups.data ?? [];
  const [chosen, setChosen] = useState<string | null>(null);
  const current = chosen ?? list[0]?.id ?? null;
  return (
    <div className="grid gap-8 lg:grid-cols-[18rem_1fr]">
      <div className="space-y-6">
        <section aria-labelledby="my-groups">
          <h2 id="my-groups" className="text-xl">My groups</h2>
          {groups.error && <p className="cw-alert" role="alert">{failureMessage(groups.error)}</p>}
          {list.length === 0 && groups.isSuccess && <p className="mt-2 text-ink-soft">You are in no group yet.</p>}
          <ul className="mt-2 space-y-1" data-testid="group-list">
            {list.map((g) => (
              <li key={g.id}>
                <button type="button" className={`w-full rounded-md border px-3 py-2 text-left ${g.id === current ? 'border-copper' : 'border-rule'}`} aria-pressed={g.id === current} onClick={() => setChosen(g.id)}>
                  <span className="font-medium">{g.name}</span>
                  <span className="block text-sm text-ink-soft">{roleName[g.role]} · {g.memberCount} {g.memberCount === 1 ? 'person' : 'people'}</span>
                </button>
              </li>
            ))}
          </ul>
        </section>
        <CreateGroup onCreated={setChosen} />
      </div>
      {current ? <GroupDetail key={current} groupId={current} myUserId={myUserId} verified={verified} onGone={() => setChosen(null)} /> : <p className="text-ink-soft">Make a group for your club, class or workshop, then invite the people you build with.</p>}
    </div>
  );
}

function CreateGroup({ onCreated }: { onCreated: (id: string) => void }) {
  const create = useCreateGroup();
  const [name, setName] = useState('');
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  async function submit(e: FormEvent) {
    e.preventDefault();
    setFailure(null);
    try {
      const g = await create.mutateAsync(name);
      setName('');
      onCreated(g.id);
    } catch (err) {
      if (err instanceof ApiFailure) setFailure(err);
    }
  }
  const err = failure?.byPath.name;
  return (
    <form className="cw-card space-y-2" onSubmit={(e) => void submit(e)} noValidate aria-labelledby="new-group">
      <h2 id="new-group" className="text-lg">New group</h2>
      <label htmlFor="group-name" className="cw-label">Group name</label>
      <input id="group-name" className="cw-input" value={name} onChange={(e) => setName(e.target.value)} aria-invalid={err ? true : undefined} aria-describedby={err ? 'group-name-error' : undefined} />
      {err && <p id="group-name-error" className="cw-field-error">{err}</p>}
      <button type="submit" className="cw-btn cw-btn-primary" disabled={create.isPending}>Create group</button>
      {failure && !err && <p className="cw-alert" role="alert">{failure.message}</p>}
    </form>
  );
}

function GroupDetail({ groupId, myUserId, verified, onGone }: { groupId: string; myUserId: string; verified: boolean; onGone: () => void }) {
  const group = useGroup(groupId);
  const isAdmin = group.data?.role === 'admin';
  const invitations = useGroupInvitations(groupId, isAdmin);
  const setRole = useSetGroupRole(groupId);
  const remove = useRemoveFromGroup(groupId);
  const transfer = useTransferGroup(groupId);
  const invite = useInviteToGroup(groupId);
  const withdraw = useWithdrawGroupInvitation(groupId);
  const del = useDeleteGroup(groupId);
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const [email, setEmail] = useState('');
  const [role, setInviteRole] = useState<GroupInviteRole>('member');
  const [inviteFailure, setInviteFailure] = useState<ApiFailure | null>(null);
  const busy = [setRole, remove, transfer, invite, withdraw, del].some((m) => m.isPending);

  async function act<T>(run: () => Promise<T>, done: string, after?: () => void) {
    setError(null);
    setStatus(null);
    try {
      await run();
      setStatus(done);
      after?.();
      await group.refetch();
      if (isAdmin) await invitations.refetch();
    } catch (e) {
      setError(failureMessage(e));
    }
  }

  async function sendInvite(e: FormEvent) {
    e.preventDefault();
    setInviteFailure(null);
    setStatus(null);
    try {
      await invite.mutateAsync({ email: email.trim(), role });
      setStatus(`Invitation sent to ${email.trim()}.`);
      setEmail('');
      await invitations.refetch();
    } catch (err) {
      if (err instanceof ApiFailure) setInviteFailure(err);
    }
  }

  if (group.error) return <p className="cw-alert" role="alert">{failureMessage(group.error)}</p>;
  if (!group.data) return <p className="text-ink-soft">Loading…</p>;
  const g = group.data;
  const emailErr = inviteFailure?.byPath.email;
  return (
    <div className="space-y-8">
      <div>
        <h2 className="text-2xl" data-testid="group-name">{g.name}</h2>
        <p className="text-ink-soft">{g.role ? `You are ${g.role === 'admin' ? 'the admin' : `a ${g.role}`}: you ${roleHelp[g.role]}.` : 'You read this group as a site administrator.'}</p>
      </div>
      <FormMessage error={error} success={status} />
      <section aria-labelledby="members-title">
        <h3 id="members-title" className="text-xl">Members</h3>
        <div className="mt-3 overflow-x-auto rounded-lg border border-rule bg-panel">
          <table className="w-full min-w-[36rem] border-collapse text-left" data-testid="group-members">
            <caption className="sr-only">People in {g.name}</caption>
            <thead className="border-b border-rule text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2 font-medium">Name</th>
                <th scope="col" className="px-3 py-2 font-medium">Role</th>
                <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {g.members.map((m) => (
                <tr key={m.userId} className="border-b border-rule last:border-b-0" data-user-id={m.userId}>
                  <td className="px-3 py-2">
                    <span className="font-medium">{m.name || '—'}</span>
                    {m.userId === myUserId && <span className="ml-1 text-sm text-ink-soft">(you)</span>}
                    {m.email && <span className="block text-sm break-all text-ink-soft">{m.email}</span>}
                  </td>
                  <td className="px-3 py-2">
                    {isAdmin && m.role !== 'admin' ? (
                      <select className="cw-input min-h-9 w-auto py-1" aria-label={`Role of ${m.name}`} value={m.role} disabled={busy} onChange={(e) => void act(() => setRole.mutateAsync({ userId: m.userId, role: e.target.value as GroupInviteRole }), `${m.name} is now a ${e.target.value}.`)}>
                        <option value="member">Member (edits)</option>
                        <option value="supervisor">Supervisor (edits and signs off)</option>
                      </select>
                    ) : (
                      roleName[m.role]
                    )}
                  </td>
                  <td className="px-3 py-2">
                    <div className="flex justify-end gap-1">
                      {isAdmin && m.role !== 'admin' && (
                        <>
                          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => transfer.mutateAsync(m.userId), `${m.name} is now the admin.`)}>
                            Make admin<span className="sr-only"> {m.name}</span>
                          </button>
                          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => remove.mutateAsync(m.userId), `${m.name} was removed from the group.`)}>
                            Remove<span className="sr-only"> {m.name}</span>
                          </button>
                        </>
                      )}
                      {m.userId === myUserId && m.role !== 'admin' && (
                        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => remove.mutateAsync(m.userId), 'You left the group.', onGone)}>
                          Leave this group
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
      {isAdmin && (
        <section aria-labelledby="invite-title" className="cw-card">
          <h3 id="invite-title" className="text-xl">Invite by e-mail</h3>
          {!verified && <p className="mt-1 text-sm">Confirm your e-mail address first (see the mail we sent when you signed up); then you can invite people.</p>}
          <form className="mt-3 grid gap-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end" onSubmit={(e) => void sendInvite(e)} noValidate>
            <div>
              <label htmlFor="group-invite-email" className="cw-label">E-mail address</label>
              <input id="group-invite-email" type="email" className="cw-input" value={email} onChange={(e) => setEmail(e.target.value)} disabled={!verified} aria-invalid={emailErr ? true : undefined} aria-describedby={emailErr ? 'group-invite-email-error' : undefined} />
              {emailErr && <p id="group-invite-email-error" className="cw-field-error">{emailErr}</p>}
            </div>
            <div>
              <label htmlFor="group-invite-role" className="cw-label">Role</label>
              <select id="group-invite-role" className="cw-input" value={role} onChange={(e) => setInviteRole(e.target.value as GroupInviteRole)} disabled={!verified}>
                <option value="member">Member</option>
                <option value="supervisor">Supervisor</option>
              </select>
            </div>
            <button type="submit" className="cw-btn cw-btn-primary" disabled={!verified || invite.isPending}>Send invitation</button>
          </form>
          {inviteFailure && !emailErr && <p className="cw-alert mt-2" role="alert">{inviteFailure.message}</p>}
          <p className="mt-2 text-sm text-ink-soft">The link works once, for two weeks. A supervisor should be someone experienced with high voltage.</p>
          {(invitations.data ?? []).length > 0 && (
            <ul className="mt-3 space-y-1" aria-label="Open invitations">
              {(invitations.data ?? []).map((i) => (
                <li key={i.id} className="flex flex-wrap items-center gap-2 text-sm">
                  <span>{i.email} as {i.role}{i.expired ? ' (expired)' : ''}</span>
                  <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void act(() => withdraw.mutateAsync(i.id), `Invitation to ${i.email} withdrawn.`)}>
                    Withdraw<span className="sr-only"> the invitation to {i.email}</span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </section>
      )}
      {isAdmin && (
        <section aria-labelledby="danger-title">
          <h3 id="danger-title" className="text-lg">Delete the group</h3>
          <p className="text-sm text-ink-soft">Its designs stay with their owners; members lose the access the group gave them.</p>
          <button type="button" className="cw-btn cw-btn-quiet mt-2" disabled={busy} onClick={() => { if (window.confirm(`Delete the group “${g.name}”?`)) void act(() => del.mutateAsync(), 'The group was deleted.', onGone); }}>
            Delete “{g.name}”
          </button>
        </section>
      )}
    </div>
  );
}

export default withApi(GroupsPanel);
