import { authClient } from '~/lib/auth-client';
import type { ErrorLike } from '~/lib/errors';
import type { SiteRoleName } from './list-users';

export type ActionResult = { ok: true } | { ok: false; error: ErrorLike };

export async function setUserRole(userId: string, role: SiteRoleName): Promise<ActionResult> {
  const { error } = await authClient.admin.setRole({ userId, role });
  return error ? { ok: false, error } : { ok: true };
}

/** Disabling is better-auth's ban without an end date: the account cannot sign in until enabled again. */
export async function setUserDisabled(userId: string, disabled: boolean): Promise<ActionResult> {
  const { error } = disabled
    ? await authClient.admin.banUser({ userId, banReason: 'Disabled by a site administrator' })
    : await authClient.admin.unbanUser({ userId });
  return error ? { ok: false, error } : { ok: true };
}
