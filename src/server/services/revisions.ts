import { and, desc, eq } from 'drizzle-orm';
import type { z } from 'zod';
import { database } from './database';
import { designRevisions, user } from '../db/schema';
import type { copyDesignBodySchema, CompareResponse, DesignRecord, restoreRevisionBodySchema, RevisionListItem, RevisionRecord } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { compareDesigns } from '../../lib/library/compare';
import { authorize } from './access';
import { createDesign, updateDesign } from './designs';
import { sharedRow } from './shares';
import { solveStored } from './solve';
import { copyName } from '../../lib/design/name';

async function revisionRow(designId: string, n: number) {
  const r = await database().query.designRevisions.findFirst({ where: and(eq(designRevisions.designId, designId), eq(designRevisions.revision, n)) });
  if (!r) throw new ApiError('not_found', 'No such revision.');
  return r;
}

/** Every saved revision, newest first. */
export async function listRevisions(u: SessionUser, id: string): Promise<RevisionListItem[]> {
  await authorize(id, u, 'read');
  return revisionsOf(id);
}

/** Every saved revision of a design already authorized, newest first. */
export async function revisionsOf(id: string): Promise<RevisionListItem[]> {
  const rows = await database()
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

/** One revision, read-only, with its result. */
export async function getRevision(u: SessionUser, id: string, revision: number): Promise<RevisionRecord> {
  await authorize(id, u, 'read');
  return revisionOf(id, revision);
}

/** One revision of a design already authorized, read-only, with its result. */
export async function revisionOf(id: string, revision: number): Promise<RevisionRecord> {
  const r = await revisionRow(id, revision);
  return { revision: r.revision, name: r.name, design: r.design, createdAt: r.createdAt.toISOString(), message: r.message, result: solveStored(r.design) };
}

/**
 * Saves an old revision's name and design as a new revision. With `revision` in the body the save is refused
 * (409) when someone saved after that revision, like any other save.
 */
export async function restoreRevision(u: SessionUser, designId: string, n: number, body: z.output<typeof restoreRevisionBodySchema>): Promise<DesignRecord> {
  const b = body ?? {};
  const { row } = await authorize(designId, u, 'write');
  const old = await revisionRow(designId, n);
  return updateDesign(u, designId, {
    name: old.name,
    design: old.design,
    revision: b.revision ?? row.revision,
    message: b.message ?? `Restored revision ${n}`,
  });
}

/** Two revisions side by side: the inputs that changed and what that did to the key results. */
export async function compareRevisions(u: SessionUser, designId: string, from: number, to: number): Promise<CompareResponse> {
  await authorize(designId, u, 'read');
  return compareOf(designId, from, to);
}

/** Two revisions of a design already authorized, side by side. */
export async function compareOf(designId: string, from: number, to: number): Promise<CompareResponse> {
  const [a, b] = [await revisionRow(designId, from), await revisionRow(designId, to)];
  const diff = compareDesigns({ design: a.design, result: solveStored(a.design) }, { design: b.design, result: solveStored(b.design) });
  const side = (r: typeof a) => ({ revision: r.revision, name: r.name, createdAt: r.createdAt.toISOString(), message: r.message });
  return { from: side(a), to: side(b), nameChanged: a.name !== b.name, ...diff };
}

/** A new design owned by the caller, at revision 1, from any design they can read. */
export async function duplicateDesign(u: SessionUser, designId: string, body: z.output<typeof copyDesignBodySchema>): Promise<DesignRecord> {
  const { row } = await authorize(designId, u, 'read');
  return createDesign(u, { name: body?.name ?? copyName(row.name), design: row.design, message: `Copied from “${row.name}”` });
}

/** A shared design copied into the caller's library. */
export async function copyShared(u: SessionUser, token: string, body: z.output<typeof copyDesignBodySchema>): Promise<DesignRecord> {
  const shared = await sharedRow(token);
  return createDesign(u, { name: body?.name ?? copyName(shared.name), design: shared.design, message: 'Copied from a shared link' });
}
