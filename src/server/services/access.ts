import { and, eq, sql } from 'drizzle-orm';
import { database, preparedPerDatabase } from './database';
import { designs, designMembers, groupMembers } from '../db/schema';
import { designCan, designRoleOfGroupRole, strongerDesignRole, type DesignAction, type DesignRole, type GroupRole } from '../../lib/permissions';
import type { SessionUser } from '../session';
import { ApiError } from '../http';

export type DesignRow = typeof designs.$inferSelect;

export type DesignAccess = {
  row: DesignRow;
  role: DesignRole;
  /** the caller's role in the design's group, when the design belongs to one and the caller is in it */
  groupRole: GroupRole | null;
  /** how the role was reached: a role of one's own on the design, or through the design's group */
  via: 'direct' | 'group' | 'site';
};

/** The design lookup every authorization starts with. */
const designById = preparedPerDatabase((db) => db.query.designs.findFirst({ where: eq(designs.id, sql.placeholder('id')) }).prepare());

/**
 * The caller's role on a design: owner, a member role, the role their group role grants on a group's design (the
 * stronger of the two when both apply), or admin for site admins; null without one. Group membership is read on
 * every call, so a person removed from a group loses the design at once.
 */
export async function roleOn(designId: string, u: SessionUser | null): Promise<DesignAccess | null> {
  const row = await designById(database()).execute({ id: designId });
  if (!row || !u) return null;
  const found = await roleOnRow(row, u);
  return found ? { row, ...found } : null;
}

/** The part of a design row that decides roles (and names the revision), without the design itself. */
export type DesignHead = Pick<DesignRow, 'id' | 'ownerId' | 'groupId' | 'name' | 'revision' | 'updatedAt'>;

async function roleOnRow(row: Pick<DesignRow, 'id' | 'ownerId' | 'groupId'>, u: SessionUser): Promise<Omit<DesignAccess, 'row'> | null> {
  const db = database();
  const designId = row.id;
  const g = row.groupId ? await db.query.groupMembers.findFirst({ where: and(eq(groupMembers.groupId, row.groupId), eq(groupMembers.userId, u.id)) }) : undefined;
  const groupRole = g?.role ?? null;
  if (row.ownerId === u.id) return { role: 'owner', groupRole, via: 'direct' };
  const m = await db.query.designMembers.findFirst({ where: and(eq(designMembers.designId, designId), eq(designMembers.userId, u.id)) });
  const fromGroup = groupRole ? designRoleOfGroupRole(groupRole) : null;
  if (m || fromGroup) {
    const role = strongerDesignRole(m?.role ?? null, fromGroup);
    return { role, groupRole, via: m && (!fromGroup || role === m.role) ? 'direct' : 'group' };
  }
  if (u.role === 'admin') return { role: 'admin', groupRole: null, via: 'site' };
  return null;
}

const designHeadById = preparedPerDatabase((db) =>
  db
    .select({ id: designs.id, ownerId: designs.ownerId, groupId: designs.groupId, name: designs.name, revision: designs.revision, updatedAt: designs.updatedAt })
    .from(designs)
    .where(eq(designs.id, sql.placeholder('id')))
    .prepare(),
);

/**
 * Like {@link authorize}, reading only the design's head (owner, group, name, revision, update time), for a
 * caller that answers from what it stored for that revision and reads the whole row only when it has nothing.
 */
export async function authorizeHead(designId: string, u: SessionUser | null, action: DesignAction): Promise<{ head: DesignHead; role: DesignRole }> {
  const head = await designHeadById(database()).get({ id: designId });
  const found = head && u ? await roleOnRow(head, u) : null;
  if (!head || !found) throw new ApiError('not_found', 'No such design.');
  if (!designCan(found.role, action)) throw new ApiError('forbidden');
  return { head, role: found.role };
}

/** Loads a design the user may act on; no role at all is a 404 so a stranger learns nothing. */
export async function authorize(designId: string, u: SessionUser | null, action: DesignAction) {
  const found = await roleOn(designId, u);
  if (!found) throw new ApiError('not_found', 'No such design.');
  if (!designCan(found.role, action)) throw new ApiError('forbidden');
  return found;
}
