import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import type { Db } from '../db/client';
import { designRevisions } from '../db/schema';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { compareDesigns } from '../../lib/library/compare';
import { authorize, createDesign, designNameSchema, getShared, parseBody, updateDesign } from './designs';
import { solveStored } from './solve';
import { copyName } from '../../lib/design/name';

export const restoreRevisionBody = z
  .object({
    revision: z.number({ error: 'Give the latest revision you saw (a whole number).' }).int().min(1).optional(),
    message: z.string().max(500, 'Keep the message under 500 characters.').optional(),
  })
  .optional();

export const compareQuery = z.object({ from: z.coerce.number().int().min(1), to: z.coerce.number().int().min(1) });

export const copyDesignBody = z.object({ name: designNameSchema.optional() }).optional();


async function revisionRow(db: Db, designId: string, n: number) {
  const r = await db.query.designRevisions.findFirst({ where: and(eq(designRevisions.designId, designId), eq(designRevisions.revision, n)) });
  if (!r) throw new ApiError('not_found', 'No such revision.');
  return r;
}

/**
 * Saves an old revision's name and design as a new revision. With `revision` in the body the save is refused
 * (409) when someone saved after that revision, like any other save.
 */
export async function restoreRevision(db: Db, u: SessionUser, designId: string, n: number, body: unknown) {
  const b = parseBody(restoreRevisionBody, body) ?? {};
  const { row } = await authorize(db, designId, u, 'write');
  const old = await revisionRow(db, designId, n);
  return updateDesign(db, u, designId, {
    name: old.name,
    design: old.design,
    revision: b.revision ?? row.revision,
    message: b.message ?? `Restored revision ${n}`,
  });
}

export function parseRevisionNumber(raw: string | null | undefined, path: string): number {
  const n = Number(raw);
  if (!raw || !Number.isInteger(n) || n < 1) throw new ApiError('validation_failed', 'Give two revision numbers to compare.', [{ path, message: 'A whole revision number is needed.' }]);
  return n;
}

export async function compareRevisions(db: Db, u: SessionUser, designId: string, from: number, to: number) {
  await authorize(db, designId, u, 'read');
  const [a, b] = [await revisionRow(db, designId, from), await revisionRow(db, designId, to)];
  const diff = compareDesigns({ design: a.design, result: solveStored(a.design) }, { design: b.design, result: solveStored(b.design) });
  const side = (r: typeof a) => ({ revision: r.revision, name: r.name, createdAt: r.createdAt.toISOString(), message: r.message });
  return { from: side(a), to: side(b), nameChanged: a.name !== b.name, ...diff };
}

/** A new design owned by the caller, at revision 1, from any design they can read. */
export async function duplicateDesign(db: Db, u: SessionUser, designId: string, body: unknown) {
  const b = parseBody(copyDesignBody, body) ?? {};
  const { row } = await authorize(db, designId, u, 'read');
  return createDesign(db, u, { name: b.name ?? copyName(row.name), design: row.design, message: `Copied from “${row.name}”` });
}

export async function copyShared(db: Db, u: SessionUser, token: string, body: unknown) {
  const b = parseBody(copyDesignBody, body) ?? {};
  const shared = await getShared(db, token);
  return createDesign(db, u, { name: b.name ?? copyName(shared.name), design: shared.design, message: 'Copied from a shared link' });
}
