import { and, desc, eq, isNull } from 'drizzle-orm';
import { randomBytes } from 'node:crypto';
import { database } from './database';
import { designs, designShares } from '../db/schema';
import type { SharedDesign, ShareLink, ShareListItem } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize, type DesignRow } from './access';
import { solvedRow } from './solve';
import { calibrationOf } from './measurements';

export function newShareToken(): string {
  return randomBytes(24).toString('base64url'); // 192 bits
}

const linkOf = (origin: string, token: string) => `${origin}/s/${token}`;

export async function createShare(u: SessionUser, id: string, origin: string): Promise<ShareLink> {
  await authorize(id, u, 'share');
  const token = newShareToken();
  await database().insert(designShares).values({ token, designId: id, createdBy: u.id });
  return { token, url: linkOf(origin, token) };
}

export async function listShares(u: SessionUser, id: string, origin: string): Promise<ShareListItem[]> {
  await authorize(id, u, 'share');
  const rows = await database()
    .select()
    .from(designShares)
    .where(and(eq(designShares.designId, id), isNull(designShares.revokedAt)))
    .orderBy(desc(designShares.createdAt));
  return rows.map((s) => ({ token: s.token, url: linkOf(origin, s.token), createdAt: s.createdAt.toISOString() }));
}

export async function revokeShare(u: SessionUser, id: string, token: string): Promise<void> {
  await authorize(id, u, 'share');
  const res = await database()
    .update(designShares)
    .set({ revokedAt: new Date() })
    .where(and(eq(designShares.designId, id), eq(designShares.token, token), isNull(designShares.revokedAt)))
    .returning({ token: designShares.token });
  if (res.length === 0) throw new ApiError('not_found', 'No such share link.');
}

/** The design behind a live share link; an unknown, malformed or revoked token is a 404. */
export async function sharedRow(token: string): Promise<DesignRow> {
  const gone = () => new ApiError('not_found', 'This link does not exist or was revoked.');
  if (!/^[A-Za-z0-9_-]{16,64}$/.test(token)) throw gone();
  const db = database();
  const s = await db.query.designShares.findFirst({ where: and(eq(designShares.token, token), isNull(designShares.revokedAt)) });
  if (!s) throw gone();
  const row = await db.query.designs.findFirst({ where: eq(designs.id, s.designId) });
  if (!row) throw gone();
  return row;
}

/** GET /api/v1/shared/:token, without sign-in. */
export async function getShared(token: string): Promise<SharedDesign> {
  const row = await sharedRow(token);
  const solved = solvedRow(row);
  return { name: row.name, design: row.design, revision: row.revision, updatedAt: row.updatedAt.toISOString(), result: solved.result, calibration: calibrationOf(solved) };
}
