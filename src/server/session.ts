import type { SiteRole } from '../lib/permissions';

import type { UnitSystem } from '../lib/format/length';

export type { UnitSystem };

export type SessionUser = {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  role: SiteRole;
  unitSystem: UnitSystem;
};

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
