import { and, eq } from 'drizzle-orm';
import { database } from './database';
import { designs, designMembers } from '../db/schema';
import { designCan, type DesignAction, type DesignRole } from '../../lib/permissions';
import type { SessionUser } from '../session';
import { ApiError } from '../http';

export type DesignRow = typeof designs.$inferSelect;

/** The caller's role on a design (owner, member role, or admin for site admins), with the design's row; null without one. */
export async function roleOn(designId: string, u: SessionUser | null): Promise<{ row: DesignRow; role: DesignRole } | null> {
  const db = database();
  const row = await db.query.designs.findFirst({ where: eq(designs.id, designId) });
  if (!row || !u) return null;
  if (row.ownerId === u.id) return { row, role: 'owner' };
  const m = await db.query.designMembers.findFirst({ where: and(eq(designMembers.designId, designId), eq(designMembers.userId, u.id)) });
  if (m) return { row, role: m.role };
  if (u.role === 'admin') return { row, role: 'admin' };
  return null;
}

/** Loads a design the user may act on; no role at all is a 404 so a stranger learns nothing. */
export async function authorize(designId: string, u: SessionUser | null, action: DesignAction) {
  const found = await roleOn(designId, u);
  if (!found) throw new ApiError('not_found', 'No such design.');
  if (!designCan(found.role, action)) throw new ApiError('forbidden');
  return found;
}
