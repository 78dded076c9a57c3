import { useState } from 'react';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useDesignGroup, useGroups, useSetDesignGroup } from '~/lib/api/queries/groups';
import type { GroupRole } from '~/lib/api/contracts';
import { FormMessage } from '~/components/ui/FormMessage';

type Props = { designId: string; isOwner: boolean };

const groupRoleName: Record<GroupRole, string> = { admin: 'Group admin', supervisor: 'Supervisor', member: 'Member' };

/** The design's group: who reaches the design through it, and (for the owner) which group it belongs to. */
function DesignGroupPanel({ designId, isOwner }: Props) {
  const current = useDesignGroup(designId);
  const groups = useGroups();
  const setGroup = useSetDesignGroup(designId);
  const [status, setStatus] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const data = current.data;

  async function choose(value: string) {
    setStatus(null);
    setError(null);
    try {
      const r = await setGroup.mutateAsync(value || null);
      setStatus(r.groupName ? `The design now belongs to ${r.groupName}.` : 'The design belongs to no group now.');
    } catch (e) {
      setError(failureMessage(e));
    }
  }

  return (
    <div className="space-y-3">
      {isOwner && (
        <div>
          <label htmlFor="design-group" className="cw-label">Group</label>
          <select id="design-group" className="cw-input max-w-sm" value={data?.groupId ?? ''} disabled={setGroup.isPending || !data} onChange={(e) => void choose(e.target.value)}>
            <option value="">No group</option>
            {(groups.data ?? []).map((g) => (
              <option key={g.id} value={g.id}>{g.name}</option>
            ))}
          </select>
          <p className="cw-hint">Everyone in the group can then open and edit the design; its supervisors can sign it off for first light. <a href="/groups">Your groups</a></p>
        </div>
      )}
      <FormMessage error={error ?? (current.error ? failureMessage(current.error) : null)} success={status} />
      {data?.groupId ? (
        <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
          <table className="w-full min-w-[30rem] border-collapse text-left" data-testid="group-people">
            <caption className="px-3 pt-2 text-left text-sm text-ink-soft">Through the group {data.groupName}</caption>
            <thead className="border-b border-rule text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2 font-medium">Name</th>
                <th scope="col" className="px-3 py-2 font-medium">In the group</th>
                <th scope="col" className="px-3 py-2 font-medium">On this design</th>
              </tr>
            </thead>
            <tbody>
              {data.members.map((m) => (
                <tr key={m.userId} className="border-b border-rule last:border-b-0" data-user-id={m.userId}>
                  <td className="px-3 py-2 font-medium">{m.name}</td>
                  <td className="px-3 py-2">{groupRoleName[m.groupRole]}</td>
                  <td className="px-3 py-2">Editor{m.reviews ? ', signs off for first light' : ''}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        data && <p className="text-ink-soft">This design is in no group: only the people listed above reach it.</p>
      )}
    </div>
  );
}

export default withApi(DesignGroupPanel);
