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
