/** People on a design, invitations and read-only links. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type {
  AcceptInvitationResponse,
  Invitation as CreatedInvitation,
  InvitationListResponse,
  MemberRole,
  MembersResponse,
  Person,
  ShareLink,
  ShareListItem,
  InvitationListItem,
  ShareListResponse,
  TransferResponse,
  UpdateMemberResponse,
} from '../contracts';
import { keys } from './keys';

export type { Person, MemberRole };
export type Share = ShareListItem;
export type Invitation = InvitationListItem;

export function useMembers(designId: string) {
  return useQuery({ queryKey: keys.members(designId), queryFn: () => api.get<MembersResponse>(designPath(designId, '/members')).then((r) => r.members) });
}

export function useInvitations(designId: string, enabled: boolean) {
  return useQuery({
    queryKey: keys.invitations(designId),
    queryFn: () => api.get<InvitationListResponse>(designPath(designId, '/invitations')).then((r) => r.invitations),
    enabled,
  });
}

export function useShares(designId: string, enabled: boolean) {
  return useQuery({ queryKey: keys.shares(designId), queryFn: () => api.get<ShareListResponse>(designPath(designId, '/share')).then((r) => r.shares), enabled });
}

/** Every change to people, invitations or links refreshes the three lists of that design. */
function useSharingMutation<V, T>(designId: string, run: (v: V) => Promise<T>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSettled: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: keys.members(designId) }),
        qc.invalidateQueries({ queryKey: keys.invitations(designId) }),
        qc.invalidateQueries({ queryKey: keys.shares(designId) }),
      ]),
  });
}

export const useSetMemberRole = (designId: string) =>
  useSharingMutation(designId, ({ userId, role }: { userId: string; role: 'editor' | 'viewer' }) => api.patch<UpdateMemberResponse>(designPath(designId, `/members/${userId}`), { role }));
export const useRemoveMember = (designId: string) => useSharingMutation(designId, (userId: string) => api.delete(designPath(designId, `/members/${userId}`)));
export const useTransferOwnership = (designId: string) => useSharingMutation(designId, (userId: string) => api.post<TransferResponse>(designPath(designId, '/transfer'), { userId }));
export const useInvite = (designId: string) =>
  useSharingMutation(designId, ({ email, role }: { email: string; role: 'editor' | 'viewer' }) => api.post<CreatedInvitation>(designPath(designId, '/invitations'), { email, role }));
export const useWithdrawInvitation = (designId: string) => useSharingMutation(designId, (invitationId: string) => api.delete(designPath(designId, `/invitations/${invitationId}`)));
export const useCreateShare = (designId: string) => useSharingMutation(designId, () => api.post<ShareLink>(designPath(designId, '/share')));
export const useRevokeShare = (designId: string) => useSharingMutation(designId, (token: string) => api.delete(designPath(designId, `/share/${token}`)));

/** POST /api/v1/invitations/:token/accept */
export function useAcceptInvitation() {
  return useMutation({ mutationFn: (token: string) => api.post<AcceptInvitationResponse>(`/api/v1/invitations/${encodeURIComponent(token)}/accept`) });
}
