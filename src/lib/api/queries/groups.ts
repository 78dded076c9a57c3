/** Groups: mine, one with its members, invitations, roles, leaving, transfer, and a design's group. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type {
  AcceptGroupInvitationResponse,
  DesignGroupResponse,
  GroupInvitation,
  GroupInvitationListResponse,
  GroupInviteRole,
  GroupListItem,
  GroupListResponse,
  GroupRecord,
  TransferGroupResponse,
  UpdateGroupMemberResponse,
} from '../contracts';
import { keys } from './keys';

export type { GroupListItem, GroupRecord, GroupInviteRole };

const groupPath = (id: string, rest = '') => `/api/v1/groups/${encodeURIComponent(id)}${rest}`;

export function useGroups() {
  return useQuery({ queryKey: keys.groups, queryFn: () => api.get<GroupListResponse>('/api/v1/groups').then((r) => r.groups) });
}

export function useGroup(id: string | null) {
  return useQuery({ queryKey: keys.group(id ?? ''), queryFn: () => api.get<GroupRecord>(groupPath(id!)), enabled: !!id });
}

export function useGroupInvitations(id: string | null, enabled: boolean) {
  return useQuery({
    queryKey: keys.groupInvitations(id ?? ''),
    queryFn: () => api.get<GroupInvitationListResponse>(groupPath(id!, '/invitations')).then((r) => r.invitations),
    enabled: !!id && enabled,
  });
}

/** Every change to a group refreshes my groups and that group's members and invitations. */
function useGroupMutation<V, T>(run: (v: V) => Promise<T>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: run, onSettled: () => qc.invalidateQueries({ queryKey: keys.groups }) });
}

export const useCreateGroup = () => useGroupMutation((name: string) => api.post<GroupListItem>('/api/v1/groups', { name }));
export const useRenameGroup = (id: string) => useGroupMutation((name: string) => api.patch<GroupListItem>(groupPath(id), { name }));
export const useDeleteGroup = (id: string) => useGroupMutation(() => api.delete(groupPath(id)));
export const useInviteToGroup = (id: string) =>
  useGroupMutation(({ email, role }: { email: string; role: GroupInviteRole }) => api.post<GroupInvitation>(groupPath(id, '/invitations'), { email, role }));
export const useWithdrawGroupInvitation = (id: string) => useGroupMutation((invitationId: string) => api.delete(groupPath(id, `/invitations/${encodeURIComponent(invitationId)}`)));
export const useSetGroupRole = (id: string) =>
  useGroupMutation(({ userId, role }: { userId: string; role: GroupInviteRole }) => api.patch<UpdateGroupMemberResponse>(groupPath(id, `/members/${encodeURIComponent(userId)}`), { role }));
export const useRemoveFromGroup = (id: string) => useGroupMutation((userId: string) => api.delete(groupPath(id, `/members/${encodeURIComponent(userId)}`)));
export const useTransferGroup = (id: string) => useGroupMutation((userId: string) => api.post<TransferGroupResponse>(groupPath(id, '/transfer'), { userId }));
export const useAcceptGroupInvitation = () => useGroupMutation((token: string) => api.post<AcceptGroupInvitationResponse>(`/api/v1/group-invitations/${encodeURIComponent(token)}/accept`));

export function useDesignGroup(designId: string) {
  return useQuery({ queryKey: keys.designGroup(designId), queryFn: () => api.get<DesignGroupResponse>(designPath(designId, '/group')) });
}

export function useSetDesignGroup(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (groupId: string | null) => api.put<DesignGroupResponse>(designPath(designId, '/group'), { groupId }),
    onSuccess: (data) => qc.setQueryData(keys.designGroup(designId), data),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}
