import { createAccessControl } from 'better-auth/plugins/access';
import { defaultStatements, adminAc } from 'better-auth/plugins/admin/access';

/**
 * Every permission in Coilwright, in one place. Site roles (admin, member) use better-auth's access control;
 * roles on a single design (owner, editor, viewer, and admin for site admins) are listed below and checked
 * by the design services and shown by the UI.
 */
export const statement = {
  ...defaultStatements,
  design: ['read', 'write', 'delete', 'share', 'invite', 'manage-members', 'transfer'],
} as const;

export const ac = createAccessControl(statement);

export const siteRoles = {
  admin: ac.newRole({ ...adminAc.statements, design: ['read'] }),
  member: ac.newRole({ user: [], session: [], design: [] }),
} as const;

export type SiteRole = keyof typeof siteRoles;

export const designRoles = ['owner', 'editor', 'viewer', 'admin'] as const;
export type DesignRole = (typeof designRoles)[number];
export type DesignAction = (typeof statement.design)[number];

const designPermissions: Record<DesignRole, readonly DesignAction[]> = {
  owner: ['read', 'write', 'delete', 'share', 'invite', 'manage-members', 'transfer'],
  editor: ['read', 'write'],
  viewer: ['read'],
  admin: ['read'],
};

export function designCan(role: DesignRole | null | undefined, action: DesignAction): boolean {
  return role ? designPermissions[role].includes(action) : false;
}

/** Roles inside a group (admin manages it, supervisors review before first light, members build). */
export type GroupRole = 'admin' | 'member' | 'supervisor';

/**
 * The design role a group role grants on the group's designs: everyone in the group edits. Supervisors may in
 * addition decide first-light reviews (see `groupCanReview`).
 */
const groupDesignRole: Record<GroupRole, Exclude<DesignRole, 'owner' | 'admin'>> = { admin: 'editor', member: 'editor', supervisor: 'editor' };

export function designRoleOfGroupRole(role: GroupRole): DesignRole {
  return groupDesignRole[role];
}

/** Whether a group role may decide the first-light reviews of the group's designs. */
export function groupCanReview(role: GroupRole | null | undefined): boolean {
  return role === 'supervisor';
}

const strength: Record<DesignRole, number> = { admin: 0, viewer: 1, editor: 2, owner: 3 };

/** The stronger of two design roles, when a person holds one of their own and one through a group. */
export function strongerDesignRole(a: DesignRole | null, b: DesignRole | null): DesignRole {
  if (!a) return b!;
  if (!b) return a;
  return strength[b] > strength[a] ? b : a;
}
