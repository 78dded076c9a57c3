import { authClient } from '~/lib/auth-client';
import type { ErrorLike } from '~/lib/errors';

export type SiteRoleName = 'admin' | 'member';

export type UserRow = {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  role: SiteRoleName;
  disabled: boolean;
  createdAt: string;
};

export type UserPage = { rows: UserRow[]; total: number };
export type ListResult = { ok: true; page: UserPage } | { ok: false; error: ErrorLike };

function toRow(u: Record<string, unknown>): UserRow {
  const created = u.createdAt instanceof Date ? u.createdAt : new Date(String(u.createdAt ?? ''));
  return {
    id: String(u.id),
    name: String(u.name ?? ''),
    email: String(u.email ?? ''),
    emailVerified: Boolean(u.emailVerified),
    role: u.role === 'admin' ? 'admin' : 'member',
    disabled: Boolean(u.banned),
    createdAt: Number.isNaN(created.getTime()) ? '' : created.toISOString(),
  };
}

/** One page of accounts, newest first, optionally narrowed by part of an e-mail address. */
export async function listUsers(o: { limit: number; offset: number; search: string }): Promise<ListResult> {
  const search = o.search.trim();
  const { data, error } = await authClient.admin.listUsers({
    query: {
      limit: o.limit,
      offset: o.offset,
      sortBy: 'createdAt',
      sortDirection: 'desc',
      ...(search ? { searchValue: search, searchField: 'email' as const, searchOperator: 'contains' as const } : {}),
    },
  });
  if (error || !data) return { ok: false, error: error ?? {} };
  const users = (data.users ?? []) as unknown as Record<string, unknown>[];
  return { ok: true, page: { rows: users.map(toRow), total: Number(data.total ?? users.length) } };
}
