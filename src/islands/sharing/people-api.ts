import { call } from '~/lib/library/api-call';

export type Person = { userId: string; name: string; email: string | null; role: 'owner' | 'editor' | 'viewer'; since: string };
export type Share = { token: string; url: string; createdAt: string };
export type Invitation = { id: string; email: string; role: 'editor' | 'viewer'; createdAt: string; expired: boolean };

const base = (id: string) => `/api/v1/designs/${id}`;
export const listMembers = (id: string) => call<{ members: Person[] }>('GET', `${base(id)}/members`);
export const setMemberRole = (id: string, userId: string, role: 'editor' | 'viewer') => call<void>('PATCH', `${base(id)}/members/${userId}`, { role });
export const removeMember = (id: string, userId: string) => call<void>('DELETE', `${base(id)}/members/${userId}`);
export const transferOwnership = (id: string, userId: string) => call<void>('POST', `${base(id)}/transfer`, { userId });
export const invite = (id: string, email: string, role: 'editor' | 'viewer') => call<Invitation>('POST', `${base(id)}/invitations`, { email, role });
export const listInvitations = (id: string) => call<{ invitations: Invitation[] }>('GET', `${base(id)}/invitations`);
export const withdrawInvitation = (id: string, invitationId: string) => call<void>('DELETE', `${base(id)}/invitations/${invitationId}`);
export const listShares = (id: string) => call<{ shares: Share[] }>('GET', `${base(id)}/share`);
export const createShare = (id: string) => call<Share>('POST', `${base(id)}/share`);
export const revokeShare = (id: string, token: string) => call<void>('DELETE', `${base(id)}/share/${token}`);
