/** Query keys of every cached read, in one place so mutations invalidate exactly what they change. */
export const keys = {
  designs: ['designs'] as const,
  design: (id: string) => ['designs', id] as const,
  members: (id: string) => ['designs', id, 'members'] as const,
  invitations: (id: string) => ['designs', id, 'invitations'] as const,
  shares: (id: string) => ['designs', id, 'shares'] as const,
  measurements: (id: string) => ['designs', id, 'measurements'] as const,
  attachments: (id: string) => ['designs', id, 'attachments'] as const,
  winding: (id: string) => ['designs', id, 'winding'] as const,
  summary: (endpoint: string, format: string) => ['summary', endpoint, format] as const,
  users: (page: { limit: number; offset: number; search: string }) => ['admin', 'users', page] as const,
  usersAll: ['admin', 'users'] as const,
};
