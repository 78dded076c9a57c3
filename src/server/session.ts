import type { SessionUser } from '../lib/api/contracts/me';

export type { SessionUser };

/** The session's user row as the app sees it (GET /api/v1/me). */
export function toSessionUser(u: Record<string, unknown>): SessionUser {
  return {
    id: String(u.id),
    name: String(u.name ?? ''),
    email: String(u.email ?? ''),
    emailVerified: Boolean(u.emailVerified),
    role: u.role === 'admin' ? 'admin' : 'member',
    unitSystem: u.unitSystem === 'imperial' ? 'imperial' : 'metric',
  };
}
