/** Query keys of every cached read, in one place so mutations invalidate exactly what they change. */
export const keys = {
  designs: ['designs'] as const,
  design: (id: string) => ['designs', id] as const,
  members: (id: string) => ['designs', id, 'members'] as const,
  invitations: (id: string) => ['designs', id, 'invitations'] as const,
  shares: (id: string) => ['designs', id, 'shares'] as const,
  measurements: (id: string) => ['designs', id, 'measurements'] as const,
  attachments: (id: string) => ['designs', id, 'attachments'] as const,
  groups: ['groups'] as const,
  group: (id: string) => ['groups', id] as const,
  groupInvitations: (id: string) => ['groups', id, 'invitations'] as const,
  designGroup: (id: string) => ['designs', id, 'group'] as const,
  reviews: (id: string) => ['designs', id, 'reviews'] as const,
  review: (id: string, reviewId: string) => ['designs', id, 'reviews', reviewId] as const,
  summary: (endpoint: string, format: string) => ['summary', endpoint, format] as const,
  users: (page: { limit: number; offset: number; search: string }) => ['admin', 'users', page] as const,
  usersAll: ['admin', 'users'] as const,
};
