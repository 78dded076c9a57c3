import { and, eq, inArray } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { database } from './database';
import { designs, designRevisions, designMembers, groupMembers, groups } from '../db/schema';
import { designRoleOfGroupRole, strongerDesignRole, type DesignRole } from '../../lib/permissions';
import type { z } from 'zod';
import type { createDesignBodySchema, DesignListItem, DesignRecord, ResultSummary, updateDesignBodySchema } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize, authorizeHead, type DesignRow } from './access';
import { requireDesignField, resultSummary, solvedRow, solveStored } from './solve';
import { calibrationOf } from './measurements';
import { readCalibration } from '../../lib/buildsheet/calibration';

/** Whether a builder adopted any measured value on the bench for this design. */
function hasCalibration(row: DesignRow): boolean {
  return Object.keys(readCalibration(row.calibration)).length > 0;
}
import { deleteAttachmentsOf } from './attachments';

/** My designs, those shared with me and those of my groups, most recently changed first. */
export async function listDesigns(u: SessionUser): Promise<DesignListItem[]> {
  const db = database();
  const own = await db.select().from(designs).where(eq(designs.ownerId, u.id));
  const memberRows = await db
    .select({ d: designs, role: designMembers.role })
    .from(designMembers)
    .innerJoin(designs, eq(designMembers.designId, designs.id))
    .where(eq(designMembers.userId, u.id));
  const groupRows = await db
    .select({ d: designs, role: groupMembers.role })
    .from(groupMembers)
    .innerJoin(designs, eq(designs.groupId, groupMembers.groupId))
    .where(eq(groupMembers.userId, u.id));
  const byId = new Map<string, { row: DesignRow; role: DesignRole }>();
  for (const row of own) byId.set(row.id, { row, role: 'owner' });
  for (const m of [...memberRows.map((x) => ({ row: x.d, role: x.role as DesignRole })), ...groupRows.map((x) => ({ row: x.d, role: designRoleOfGroupRole(x.role) }))]) {
    const had = byId.get(m.row.id);
    byId.set(m.row.id, { row: m.row, role: had ? strongerDesignRole(had.role, m.role) : m.role });
  }
  const all = [...byId.values()];
  const groupIds = [...new Set(all.map((a) => a.row.groupId).filter((g): g is string => !!g))];
  const groupNames = new Map(groupIds.length ? (await db.select({ id: groups.id, name: groups.name }).from(groups).where(inArray(groups.id, groupIds))).map((g) => [g.id, g.name]) : []);
  all.sort((a, b) => b.row.updatedAt.getTime() - a.row.updatedAt.getTime());
  // Each save stored its result summary with the revision; read it rather than solving every design again.
  const saved = new Map<string, ResultSummary | null>();
  if (all.length) {
    const revs = await db
      .select({ designId: designRevisions.designId, revision: designRevisions.revision, summary: designRevisions.resultSummary })
      .from(designRevisions)
      .innerJoin(designs, and(eq(designRevisions.designId, designs.id), eq(designRevisions.revision, designs.revision)))
      .where(inArray(designs.id, all.map((a) => a.row.id)));
    for (const r of revs) saved.set(`${r.designId}:${r.revision}`, r.summary);
  }
  return all.map(({ row, role }) => {
    const summary = saved.get(`${row.id}:${row.revision}`) ?? resultSummary(solveStored(row.design));
    return {
      id: row.id,
      name: row.name,
      role,
      revision: row.revision,
      updatedAt: row.updatedAt.toISOString(),
      loadedFrequency: summary?.loadedFrequency ?? null,
      tapTurns: summary?.tapTurns ?? null,
      groupId: row.groupId,
      groupName: row.groupId ? (groupNames.get(row.groupId) ?? null) : null,
      calibratedTapTurns: hasCalibration(row) ? (calibrationOf(solvedRow(row)).calibrated?.tapTurns ?? null) : null,
    };
  });
}

/** A new design owned by the caller at revision 1; the design is checked first, so a refused one creates nothing. */
export async function createDesign(u: SessionUser, body: z.output<typeof createDesignBodySchema>): Promise<DesignRecord> {
  const parsed = requireDesignField(body.design);
  const name = body.name;
  const id = randomUUID();
  const result = solveStored(parsed.input);
  await database().transaction(async (tx) => {
    await tx.insert(designs).values({ id, ownerId: u.id, name, design: parsed.input, revision: 1 });
    await tx.insert(designRevisions).values({
      id: randomUUID(),
      designId: id,
      revision: 1,
      name,
      design: parsed.input,
      resultSummary: resultSummary(result),
      authorId: u.id,
      message: body.message ?? null,
    });
  });
  return { id, name, revision: 1, role: 'owner', design: parsed.input, result };
}

function designRecordOf(row: DesignRow, role: DesignRole): DesignRecord & { updatedAt: string } {
  return { id: row.id, name: row.name, design: row.design, revision: row.revision, role, updatedAt: row.updatedAt.toISOString(), groupId: row.groupId, result: solveStored(row.design) };
}

/**
 * The body of GET /api/v1/designs/:id as JSON text. A design's content changes only with a new revision (a
 * save writes the design and the next revision number in one statement), so the text is kept per revision,
 * name, update time, group and the caller's role, and a read of the same revision sends the same bytes again.
 */
export async function getDesignJson(u: SessionUser | null, id: string): Promise<string> {
  const { head, role } = await authorizeHead(id, u, 'read');
  const hit = designTexts.get(designTextKey(head, role));
  if (hit !== undefined) return hit;
  // Nothing kept for this revision: read the whole row, and keep its text under the row's own key.
  const full = await authorize(id, u, 'read');
  const text = JSON.stringify(designRecordOf(full.row, full.role));
  designTexts.set(designTextKey(full.row, full.role), text);
  if (designTexts.size > 256) designTexts.delete(designTexts.keys().next().value as string);
  return text;
}

function designTextKey(h: Pick<DesignRow, 'id' | 'revision' | 'updatedAt' | 'name' | 'groupId'>, role: DesignRole): string {
  return `${h.id}\u0000${h.revision}\u0000${h.updatedAt.getTime()}\u0000${h.name}\u0000${h.groupId ?? ''}\u0000${role}`;
}

const designTexts = new Map<string, string>();

/** Saves a new revision; `revision` must be the latest, or nothing is written and the answer is 409 with the latest. */
export async function updateDesign(u: SessionUser, id: string, body: z.output<typeof updateDesignBodySchema>): Promise<DesignRecord> {
  const { row, role } = await authorize(id, u, 'write');
  const parsed = requireDesignField(body.design);
  const name = body.name ?? row.name;
  const next = body.revision + 1;
  const result = solveStored(parsed.input);
  const db = database();
  const ok = await db.transaction(async (tx) => {
    // The revision check and the write happen in one statement, so two saves of the same revision cannot both land.
    const updated = await tx
      .update(designs)
      .set({ name, design: parsed.input, revision: next, updatedAt: new Date() })
      .where(and(eq(designs.id, id), eq(designs.revision, body.revision)))
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
      message: body.message ?? null,
    });
    return true;
  });
  if (!ok) {
    const latest = await db.query.designs.findFirst({ where: eq(designs.id, id) });
    throw new ApiError('conflict', undefined, undefined, { latestRevision: latest?.revision ?? row.revision });
  }
  return { id, name, design: parsed.input, revision: next, role, result };
}

/** Deletes a design with its revisions, members, links and stored files (owner only). */
export async function deleteDesign(u: SessionUser, id: string): Promise<void> {
  await authorize(id, u, 'delete');
  await deleteAttachmentsOf(id);
  await database().delete(designs).where(eq(designs.id, id));
}
