import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import { randomBytes, randomUUID } from 'node:crypto';
import { z } from 'zod';
import type { Db } from '../db/client';
import { designs, designRevisions, designMembers, designShares, user } from '../db/schema';
import { designCan, type DesignAction, type DesignRole } from '../../lib/permissions';
import { designNameSchema } from '../../lib/design/schema';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { prefixIssues, solveStored, validateDesign } from './solve';
import { deleteAttachmentsOf } from './attachments';

export { designNameSchema };

export const createDesignBody = z.object({ name: designNameSchema, design: z.unknown(), message: z.string().max(500).optional() });
export const updateDesignBody = z.object({
  name: designNameSchema.optional(),
  design: z.unknown(),
  revision: z.number({ error: 'Give the revision you edited (a whole number).' }).int().min(1),
  message: z.string().max(500, 'Keep the message under 500 characters.').optional(),
});

export function parseBody<T extends z.ZodType>(schema: T, body: unknown): z.output<T> {
  const r = schema.safeParse(body);
  if (!r.success) {
    throw new ApiError(
      'validation_failed',
      'Some fields need attention.',
      r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
    );
  }
  return r.data;
}

function needDesign(body: { design?: unknown }) {
  if (body.design === undefined) throw new ApiError('validation_failed', 'Some fields need attention.', [{ path: 'design', message: 'The design is missing.' }]);
  try {
    return validateDesign(body.design);
  } catch (e) {
    if (e instanceof ApiError && e.issues) throw new ApiError(e.code, e.message, prefixIssues(e.issues, 'design'));
    throw e;
  }
}

type DesignRow = typeof designs.$inferSelect;

export async function roleOn(db: Db, designId: string, u: SessionUser | null): Promise<{ row: DesignRow; role: DesignRole } | null> {
  const row = await db.query.designs.findFirst({ where: eq(designs.id, designId) });
  if (!row || !u) return null;
  if (row.ownerId === u.id) return { row, role: 'owner' };
  const m = await db.query.designMembers.findFirst({ where: and(eq(designMembers.designId, designId), eq(designMembers.userId, u.id)) });
  if (m) return { row, role: m.role };
  if (u.role === 'admin') return { row, role: 'admin' };
  return null;
}

/** Loads a design the user may act on; no role at all is a 404 so a stranger learns nothing. */
export async function authorize(db: Db, designId: string, u: SessionUser | null, action: DesignAction) {
  const found = await roleOn(db, designId, u);
  if (!found) throw new ApiError('not_found', 'No such design.');
  if (!designCan(found.role, action)) throw new ApiError('forbidden');
  return found;
}

export function resultSummary(result: ReturnType<typeof solveStored>) {
  if (!result) return null;
  return {
    loadedFrequency: result.system?.resonantFrequency ?? null,
    tapTurns: result.tuning?.tapTurns ?? null,
    k: result.coupling?.k ?? null,
    inductance: result.secondary?.inductance ?? null,
  };
}

export async function listDesigns(db: Db, u: SessionUser) {
  const own = await db.select().from(designs).where(eq(designs.ownerId, u.id));
  const memberRows = await db
    .select({ d: designs, role: designMembers.role })
    .from(designMembers)
    .innerJoin(designs, eq(designMembers.designId, designs.id))
    .where(eq(designMembers.userId, u.id));
  const all: Array<{ row: DesignRow; role: DesignRole }> = [
    ...own.map((row) => ({ row, role: 'owner' as const })),
    ...memberRows.map((m) => ({ row: m.d, role: m.role })),
  ];
  all.sort((a, b) => b.row.updatedAt.getTime() - a.row.updatedAt.getTime());
  // Each save stored its result summary with the revision; read it rather than solving every design again.
  const saved = new Map<string, unknown>();
  if (all.length) {
    const revs = await db
      .select({ designId: designRevisions.designId, revision: designRevisions.revision, summary: designRevisions.resultSummary })
      .from(designRevisions)
      .innerJoin(designs, and(eq(designRevisions.designId, designs.id), eq(designRevisions.revision, designs.revision)))
      .where(inArray(designs.id, all.map((a) => a.row.id)));
    for (const r of revs) saved.set(`${r.designId}:${r.revision}`, r.summary);
  }
  return all.map(({ row, role }) => {
    const stored = saved.get(`${row.id}:${row.revision}`) as ReturnType<typeof resultSummary> | undefined;
    const summary = stored ?? resultSummary(solveStored(row.design));
    return {
      id: row.id,
      name: row.name,
      role,
      revision: row.revision,
      updatedAt: row.updatedAt.toISOString(),
      loadedFrequency: summary?.loadedFrequency ?? null,
      tapTurns: summary?.tapTurns ?? null,
    };
  });
}

export async function createDesign(db: Db, u: SessionUser, body: unknown) {
  const b = parseBody(createDesignBody, body);
  const parsed = needDesign(b);
  const id = randomUUID();
  const result = solveStored(parsed.input);
  await db.transaction(async (tx) => {
    await tx.insert(designs).values({ id, ownerId: u.id, name: b.name, design: parsed.input, revision: 1 });
    await tx.insert(designRevisions).values({
      id: randomUUID(),
      designId: id,
      revision: 1,
      name: b.name,
      design: parsed.input,
      resultSummary: resultSummary(result),
      authorId: u.id,
      message: b.message ?? null,
    });
  });
  return { id, name: b.name, revision: 1, role: 'owner' as const, design: parsed.input, result };
}

export async function getDesign(db: Db, u: SessionUser | null, id: string) {
  const { row, role } = await authorize(db, id, u, 'read');
  return { id: row.id, name: row.name, design: row.design, revision: row.revision, role, updatedAt: row.updatedAt.toISOString(), result: solveStored(row.design) };
}

export async function updateDesign(db: Db, u: SessionUser, id: string, body: unknown) {
  const b = parseBody(updateDesignBody, body);
  const { row, role } = await authorize(db, id, u, 'write');
  const parsed = needDesign(b);
  const name = b.name ?? row.name;
  const next = b.revision + 1;
  const result = solveStored(parsed.input);
  const ok = await db.transaction(async (tx) => {
    // The revision check and the write happen in one statement, so two saves of the same revision cannot both land.
    const updated = await tx
      .update(designs)
      .set({ name, design: parsed.input, revision: next, updatedAt: new Date() })
      .where(and(eq(designs.id, id), eq(designs.revision, b.revision)))
      .returning({ id: designs.id });
    if (updated.length === 0) return false;
    await tx.insert(designRevisions).values({
      id: randomUUID(),
      designId: id,
      revision: next,
      name,
      design: parsed.input,
      resultSummary: resultSummary(result),
      authorId: u.id,
      message: b.message ?? null,
    });
    return true;
  });
  if (!ok) {
    const latest = await db.query.designs.findFirst({ where: eq(designs.id, id) });
    throw new ApiError('conflict', undefined, undefined, { latestRevision: latest?.revision ?? row.revision });
  }
  return { id, name, design: parsed.input, revision: next, role, result };
}

export async function deleteDesign(db: Db, u: SessionUser, id: string) {
  await authorize(db, id, u, 'delete');
  await deleteAttachmentsOf(db, id);
  await db.delete(designs).where(eq(designs.id, id));
}

export async function listRevisions(db: Db, u: SessionUser, id: string) {
  await authorize(db, id, u, 'read');
  const rows = await db
    .select({ r: designRevisions, authorName: user.name })
    .from(designRevisions)
    .leftJoin(user, eq(designRevisions.authorId, user.id))
    .where(eq(designRevisions.designId, id))
    .orderBy(desc(designRevisions.revision));
  return rows.map(({ r, authorName }) => ({
    revision: r.revision,
    createdAt: r.createdAt.toISOString(),
    author: authorName ?? 'former member',
    name: r.name,
    message: r.message,
    summary: r.resultSummary,
  }));
}

export async function getRevision(db: Db, u: SessionUser, id: string, revision: number) {
  await authorize(db, id, u, 'read');
  const r = await db.query.designRevisions.findFirst({ where: and(eq(designRevisions.designId, id), eq(designRevisions.revision, revision)) });
  if (!r) throw new ApiError('not_found', 'No such revision.');
  return { revision: r.revision, name: r.name, design: r.design, createdAt: r.createdAt.toISOString(), message: r.message, result: solveStored(r.design) };
}

export function newShareToken(): string {
  return randomBytes(24).toString('base64url'); // 192 bits
}

export async function createShare(db: Db, u: SessionUser, id: string, origin: string) {
  await authorize(db, id, u, 'share');
  const token = newShareToken();
  await db.insert(designShares).values({ token, designId: id, createdBy: u.id });
  return { token, url: `${origin}/s/${token}` };
}

export async function listShares(db: Db, u: SessionUser, id: string, origin: string) {
  await authorize(db, id, u, 'share');
  const rows = await db
    .select()
    .from(designShares)
    .where(and(eq(designShares.designId, id), isNull(designShares.revokedAt)))
    .orderBy(desc(designShares.createdAt));
  return rows.map((s) => ({ token: s.token, url: `${origin}/s/${s.token}`, createdAt: s.createdAt.toISOString() }));
}

export async function revokeShare(db: Db, u: SessionUser, id: string, token: string) {
  await authorize(db, id, u, 'share');
  const res = await db
    .update(designShares)
    .set({ revokedAt: new Date() })
    .where(and(eq(designShares.designId, id), eq(designShares.token, token), isNull(designShares.revokedAt)))
    .returning({ token: designShares.token });
  if (res.length === 0) throw new ApiError('not_found', 'No such share link.');
}

export async function getShared(db: Db, token: string) {
  if (!/^[A-Za-z0-9_-]{16,64}$/.test(token)) throw new ApiError('not_found', 'This link does not exist or was revoked.');
  const s = await db.query.designShares.findFirst({ where: and(eq(designShares.token, token), isNull(designShares.revokedAt)) });
  if (!s) throw new ApiError('not_found', 'This link does not exist or was revoked.');
  const row = await db.query.designs.findFirst({ where: eq(designs.id, s.designId) });
  if (!row) throw new ApiError('not_found', 'This link does not exist or was revoked.');
  return { name: row.name, design: row.design, revision: row.revision, updatedAt: row.updatedAt.toISOString(), result: solveStored(row.design) };
}
