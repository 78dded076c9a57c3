/**
 * Site administration: accounts listed, re-roled, disabled. These are better-auth's admin endpoints, reached through
 * its own client; the hooks give them the same cache and loading state as every other island.
 */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { authClient } from '../../auth-client';
import type { ErrorLike } from '../../errors';
import { keys } from './keys';

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

/** A failed better-auth call, kept with its code so the words come from errors.ts. */
export class AuthFailure extends Error {
  readonly error: ErrorLike;
  constructor(error: ErrorLike) {
    super(error.message ?? 'auth call failed');
    this.name = 'AuthFailure';
    this.error = error;
  }
}

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
export async function listUsers(o: { limit: number; offset: number; search: string }): Promise<UserPage> {
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
  if (error || !data) throw new AuthFailure(error ?? {});
  const users = (data.users ?? []) as unknown as Record<string, unknown>[];
  return { rows: users.map(toRow), total: Number(data.total ?? users.length) };
}

export function useUsers(page: { limit: number; offset: number; search: string }) {
  return useQuery({ queryKey: keys.users(page), queryFn: () => listUsers(page), placeholderData: keepPreviousData, retry: false });
}

async function unwrap(p: Promise<{ error: ErrorLike | null }>): Promise<void> {
  const { error } = await p;
  if (error) throw new AuthFailure(error);
}

function useAdminMutation<V>(run: (v: V) => Promise<void>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: run, onSettled: () => qc.invalidateQueries({ queryKey: keys.usersAll }) });
}

export const useSetUserRole = () => useAdminMutation(({ userId, role }: { userId: string; role: SiteRoleName }) => unwrap(authClient.admin.setRole({ userId, role })));

/** Disabling is better-auth's ban without an end date: the account cannot sign in until enabled again. */
export const useSetUserDisabled = () =>
  useAdminMutation(({ userId, disabled }: { userId: string; disabled: boolean }) =>
    unwrap(disabled ? authClient.admin.banUser({ userId, banReason: 'Disabled by a site administrator' }) : authClient.admin.unbanUser({ userId })),
  );
