import { and, asc, desc, eq, inArray, isNull } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { database } from './database';
import { designs, measurements, user, windingChecklists, windingPauses, windingReadings, windingSessions } from '../db/schema';
import {
  WINDING_FIELD_LABELS as L,
  type startWindingBodySchema,
  type windingAdoptBodySchema,
  type windingChecklistBodySchema,
  type windingFinishBodySchema,
  type windingPauseBodySchema,
  type windingReadingBodySchema,
  type windingResumeBodySchema,
  type WindingAdoptResponse,
  type WindingReadingResponse,
  type WindingSession,
  type WindingSessionListResponse,
} from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize } from './access';
import { updateDesign } from './designs';
import { sharedRow } from './shares';
import { requireSolved, solvedRow } from './solve';
import { designCan } from '../../lib/permissions';
import { DEFAULT_END_MARGIN } from '../../lib/buildsheet';
import { analyseReadings, elapsedWinding, maxHeight, TOLERANCE_TEXT, turnsAt, windingPlan } from '../../lib/winding';

type SessionRow = typeof windingSessions.$inferSelect;
type ReadingRow = typeof windingReadings.$inferSelect;
type PauseRow = typeof windingPauses.$inferSelect;
type ChecklistRow = typeof windingChecklists.$inferSelect;

const mm = (m: number) => `${(m * 1000).toFixed(1)} mm`;
const refuse = (path: string, message: string) => new ApiError('validation_failed', message, [{ path, message }]);

function view(s: SessionRow, extra: { designName: string; startedBy: string | null; readings: ReadingRow[]; pauses: PauseRow[]; checklist: ChecklistRow | null }): WindingSession {
  const spans = extra.pauses.map((p) => ({ startedAt: p.startedAt.getTime(), endedAt: p.endedAt?.getTime() ?? null }));
  const analysis = analyseReadings(extra.readings, s.startOffset, s.pitch);
  const readings = extra.readings.map((r, i) => {
    const elapsed = elapsedWinding(s.startedAt.getTime(), spans, r.at.getTime());
    const a = analysis[i];
    return {
      id: r.id,
      at: r.at.toISOString(),
      elapsed,
      expectedTurns: turnsAt(elapsed, s.rpm, s.plannedTurns),
      counter: r.counter,
      height: r.height,
      datum: r.datum,
      estimatedTurns: a.estimate?.turns ?? null,
      tolerance: a.estimate?.tolerance ?? null,
      flag: a.flag,
      bestTurns: a.bestTurns,
    };
  });
  const c = extra.checklist;
  return {
    id: s.id,
    designId: s.designId,
    designName: extra.designName,
    revision: s.revision,
    status: s.status,
    startedBy: extra.startedBy,
    rpm: s.rpm,
    spoolLength: s.spoolLength,
    startOffset: s.startOffset,
    formLength: s.formLength,
    plan: {
      turns: s.plannedTurns,
      pitch: s.pitch,
      pitchSource: s.pitchSource,
      windingDiameter: s.windingDiameter,
      insulatedDiameter: s.insulatedDiameter,
      windingLength: s.plannedLength,
      wireLength: s.plannedWire,
    },
    startedAt: s.startedAt.toISOString(),
    finishedAt: s.finishedAt?.toISOString() ?? null,
    woundTurns: s.woundTurns,
    windingLength: s.windingLength,
    notes: s.notes,
    adoptedRevision: s.adoptedRevision,
    tolerance: TOLERANCE_TEXT,
    bestTurns: readings.length ? readings[readings.length - 1].bestTurns : null,
    readings,
    pauses: extra.pauses.map((p) => ({ id: p.id, reason: p.reason, note: p.note, startedAt: p.startedAt.toISOString(), endedAt: p.endedAt?.toISOString() ?? null })),
    checklist: {
      baseEndFastened: c?.baseEndFastened ?? false,
      topEndFastened: c?.topEndFastened ?? false,
      coating: c?.coating ?? null,
      coats: c?.coats ?? null,
      dryingHours: c?.dryingHours ?? null,
      notes: c?.notes ?? null,
    },
  };
}

/** Sessions with everything they show, in one query per table. */
async function viewsOf(rows: SessionRow[]): Promise<WindingSession[]> {
  if (rows.length === 0) return [];
  const db = database();
  const ids = rows.map((r) => r.id);
  const [readings, pauses, checklists, names, starters] = await Promise.all([
    db.select().from(windingReadings).where(inArray(windingReadings.sessionId, ids)).orderBy(asc(windingReadings.at), asc(windingReadings.counter)),
    db.select().from(windingPauses).where(inArray(windingPauses.sessionId, ids)).orderBy(asc(windingPauses.startedAt)),
    db.select().from(windingChecklists).where(inArray(windingChecklists.sessionId, ids)),
    db.select({ id: designs.id, name: designs.name }).from(designs).where(inArray(designs.id, [...new Set(rows.map((r) => r.designId))])),
    db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, rows.map((r) => r.startedBy).filter((x): x is string => x !== null))),
  ]);
  const nameOf = new Map(names.map((n) => [n.id, n.name]));
  const starterOf = new Map(starters.map((n) => [n.id, n.name]));
  return rows.map((s) =>
    view(s, {
      designName: nameOf.get(s.designId) ?? '',
      startedBy: s.startedBy ? (starterOf.get(s.startedBy) ?? null) : null,
      readings: readings.filter((r) => r.sessionId === s.id),
      pauses: pauses.filter((p) => p.sessionId === s.id),
      checklist: checklists.find((c) => c.sessionId === s.id) ?? null,
    }),
  );
}

async function oneView(s: SessionRow): Promise<WindingSession> {
  return (await viewsOf([s]))[0];
}

/** The sessions of a design, newest first: all of them for owners and editors, the finished ones for everyone else who can read it. */
export async function listWindingSessions(u: SessionUser | null, designId: string): Promise<WindingSessionListResponse> {
  const { role } = await authorize(designId, u, 'read');
  return windingSessionsOf(designId, designCan(role, 'write'));
}

/** The sessions of a design already authorized (a page's loader did it): all of them for a writer, else the finished ones. */
export async function windingSessionsOf(designId: string, canWrite: boolean): Promise<WindingSessionListResponse> {
  const rows = await database().select().from(windingSessions).where(eq(windingSessions.designId, designId)).orderBy(desc(windingSessions.startedAt));
  return { sessions: await viewsOf(canWrite ? rows : rows.filter((r) => r.status === 'finished')) };
}

/** The finished sessions of a shared design, without sign-in. */
export async function listSharedWindingSessions(token: string): Promise<WindingSessionListResponse> {
  const row = await sharedRow(token);
  const rows = await database()
    .select()
    .from(windingSessions)
    .where(and(eq(windingSessions.designId, row.id), eq(windingSessions.status, 'finished')))
    .orderBy(desc(windingSessions.startedAt));
  return { sessions: await viewsOf(rows) };
}

async function sessionRow(designId: string, sessionId: string): Promise<SessionRow> {
  const s = await database().query.windingSessions.findFirst({ where: and(eq(windingSessions.id, sessionId), eq(windingSessions.designId, designId)) });
  if (!s) throw new ApiError('not_found', 'No such winding session.');
  return s;
}

/** One session; a session still running is seen only by those who can run it. */
export async function getWindingSession(u: SessionUser | null, designId: string, sessionId: string): Promise<WindingSession> {
  const { role } = await authorize(designId, u, 'read');
  const s = await sessionRow(designId, sessionId);
  if (s.status !== 'finished' && !designCan(role, 'write')) throw new ApiError('not_found', 'No such winding session.');
  return oneView(s);
}

/** A session a writer acts on, refused once finished. */
async function openSession(u: SessionUser, designId: string, sessionId: string): Promise<SessionRow> {
  await authorize(designId, u, 'write');
  const s = await sessionRow(designId, sessionId);
  if (s.status === 'finished') throw new ApiError('conflict', 'This winding session is finished; start a new one to wind again.');
  return s;
}

function notBefore(path: string, at: Date, earliest: Date, what: string) {
  if (at.getTime() < earliest.getTime()) throw refuse(path, `The ${what} (${at.toISOString()}) is before ${earliest.toISOString()}.`);
}

/** Starts a session at a winder speed; the plan (turns, pitch, wire) is taken from the design as it is now. */
export async function startWindingSession(u: SessionUser, designId: string, b: z.output<typeof startWindingBodySchema>): Promise<WindingSession> {
  const { row } = await authorize(designId, u, 'write');
  const { design, result } = requireSolved(solvedRow(row));
  const plan = windingPlan(design, result);
  if (!plan) throw new ApiError('validation_failed', 'The design has no computed secondary to wind.');
  const startOffset = b.startOffset ?? DEFAULT_END_MARGIN;
  const formLength = b.formLength ?? plan.windingLength + 2 * startOffset;
  if (formLength < startOffset + plan.windingLength) {
    throw refuse('formLength', `${L.formLength} (${mm(formLength)}) is shorter than the winding (${mm(plan.windingLength)}) plus the bare form below it (${mm(startOffset)}).`);
  }
  const db = database();
  const open = await db.query.windingSessions.findFirst({ where: and(eq(windingSessions.designId, designId), inArray(windingSessions.status, ['running', 'paused'])) });
  if (open) throw new ApiError('conflict', 'A winding session is already under way for this design; finish it first.', undefined, { sessionId: open.id });
  const id = randomUUID();
  await db.insert(windingSessions).values({
    id,
    designId,
    revision: row.revision,
    startedBy: u.id,
    status: 'running',
    rpm: b.rpm,
    spoolLength: b.spoolLength ?? null,
    startOffset,
    formLength,
    plannedTurns: plan.turns,
    pitch: plan.pitch,
    pitchSource: plan.pitchSource,
    windingDiameter: plan.windingDiameter,
    insulatedDiameter: plan.insulatedDiameter,
    plannedLength: plan.windingLength,
    plannedWire: plan.wireLength,
    startedAt: b.startedAt ? new Date(b.startedAt) : new Date(),
  });
  return oneView(await sessionRow(designId, id));
}

/**
 * Records a counter reading (and a height, when one was measured). The client makes the id: a reading already
 * stored answers `stored: false` and adds nothing, so a queue sent again after a dropped connection never
 * doubles. A count below the last one, or a height off the form, is refused and nothing is saved.
 */
export async function addWindingReading(u: SessionUser, designId: string, sessionId: string, b: z.output<typeof windingReadingBodySchema>): Promise<{ status: number; body: WindingReadingResponse }> {
  await authorize(designId, u, 'write');
  const db = database();
  const existing = await db.query.windingReadings.findFirst({ where: eq(windingReadings.id, b.id) });
  const s0 = await sessionRow(designId, sessionId);
  if (existing) {
    if (existing.sessionId !== sessionId) throw new ApiError('conflict', 'A reading with this id belongs to another session.');
    const session = await oneView(s0);
    return { status: 200, body: { stored: false, reading: session.readings.find((r) => r.id === b.id)!, session } };
  }
  const s = await openSession(u, designId, sessionId);
  const at = new Date(b.at);
  notBefore('at', at, s.startedAt, 'reading time');
  const [last] = await db.select().from(windingReadings).where(eq(windingReadings.sessionId, sessionId)).orderBy(desc(windingReadings.at), desc(windingReadings.counter)).limit(1);
  if (last && b.counter < last.counter) {
    throw refuse('counter', `${L.counter} ${b.counter} is below the last reading, ${last.counter}: a count cannot go backwards. Check the counter was not reset.`);
  }
  if (last) notBefore('at', at, last.at, 'reading time');
  const height = b.height ?? null;
  const datum = height === null ? null : (b.datum ?? null);
  if (height !== null && datum !== null) {
    const max = maxHeight(datum, s.formLength, s.startOffset);
    if (height > max) {
      const from = datum === 'form-end' ? 'from the form end' : 'from the first turn';
      throw refuse('height', `${L.height} ${mm(height)} is beyond the form: at most ${mm(max)} ${from} on a ${mm(s.formLength)} form.`);
    }
    if (datum === 'form-end' && height < s.startOffset) {
      throw refuse('height', `${L.height} ${mm(height)} from the form end is below the first turn, which starts ${mm(s.startOffset)} up the form.`);
    }
  }
  const inserted = await db
    .insert(windingReadings)
    .values({ id: b.id, sessionId, at, counter: b.counter, height, datum })
    .onConflictDoNothing()
    .returning({ id: windingReadings.id });
  const session = await oneView(await sessionRow(designId, sessionId));
  return { status: inserted.length ? 201 : 200, body: { stored: inserted.length > 0, reading: session.readings.find((r) => r.id === b.id)!, session } };
}

/** Stops the clock with a reason (move the guide, splice, break). */
export async function pauseWindingSession(u: SessionUser, designId: string, sessionId: string, b: z.output<typeof windingPauseBodySchema>): Promise<WindingSession> {
  const s = await openSession(u, designId, sessionId);
  if (s.status === 'paused') throw new ApiError('conflict', 'The session is already paused; resume it first.');
  const at = new Date(b.at);
  notBefore('at', at, s.startedAt, 'pause time');
  const db = database();
  if (b.id && (await db.query.windingPauses.findFirst({ where: eq(windingPauses.id, b.id) }))) return oneView(s);
  await db.transaction(async (tx) => {
    await tx.insert(windingPauses).values({ id: b.id ?? randomUUID(), sessionId, reason: b.reason, note: b.note || null, startedAt: at });
    await tx.update(windingSessions).set({ status: 'paused' }).where(eq(windingSessions.id, sessionId));
  });
  return oneView(await sessionRow(designId, sessionId));
}

async function closePause(tx: Pick<ReturnType<typeof database>, 'update'>, sessionId: string, at: Date) {
  await tx
    .update(windingPauses)
    .set({ endedAt: at })
    .where(and(eq(windingPauses.sessionId, sessionId), isNull(windingPauses.endedAt)));
}

async function openPause(sessionId: string) {
  return database().query.windingPauses.findFirst({ where: and(eq(windingPauses.sessionId, sessionId), isNull(windingPauses.endedAt)) });
}

/** Starts the clock again. */
export async function resumeWindingSession(u: SessionUser, designId: string, sessionId: string, b: z.output<typeof windingResumeBodySchema>): Promise<WindingSession> {
  const s = await openSession(u, designId, sessionId);
  if (s.status !== 'paused') throw new ApiError('conflict', 'The session is not paused.');
  const at = new Date(b.at);
  const p = await openPause(sessionId);
  if (p) notBefore('at', at, p.startedAt, 'resume time');
  await database().transaction(async (tx) => {
    await closePause(tx, sessionId, at);
    await tx.update(windingSessions).set({ status: 'running' }).where(eq(windingSessions.id, sessionId));
  });
  return oneView(await sessionRow(designId, sessionId));
}

/** Ends the session with what was actually wound; the turns and the measured length go into the bench log. */
export async function finishWindingSession(u: SessionUser, designId: string, sessionId: string, b: z.output<typeof windingFinishBodySchema>): Promise<WindingSession> {
  const s = await openSession(u, designId, sessionId);
  const at = new Date(b.at);
  notBefore('at', at, s.startedAt, 'finish time');
  const p = await openPause(sessionId);
  if (p) notBefore('at', at, p.startedAt, 'finish time');
  const [last] = await database().select().from(windingReadings).where(eq(windingReadings.sessionId, sessionId)).orderBy(desc(windingReadings.at)).limit(1);
  if (last) notBefore('at', at, last.at, 'finish time');
  const maxLength = s.formLength - s.startOffset;
  if (b.windingLength > maxLength) throw refuse('windingLength', `${L.windingLength} ${mm(b.windingLength)} is longer than the form leaves above the first turn (${mm(maxLength)}).`);
  const note = `From the winding session started ${s.startedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC at ${s.rpm} rpm.`;
  await database().transaction(async (tx) => {
    await closePause(tx, sessionId, at);
    await tx
      .update(windingSessions)
      .set({ status: 'finished', finishedAt: at, woundTurns: b.woundTurns, windingLength: b.windingLength, notes: b.notes || null })
      .where(eq(windingSessions.id, sessionId));
    await tx.insert(measurements).values([
      { id: randomUUID(), designId, kind: 'wound-turns', value: b.woundTurns, unit: 'turns', measuredAt: at, instrument: 'turn counter checked against the winding height', notes: note, authorId: u.id },
      { id: randomUUID(), designId, kind: 'winding-length', value: b.windingLength, unit: 'm', measuredAt: at, instrument: 'steel rule or tape', notes: note, authorId: u.id },
    ]);
  });
  return oneView(await sessionRow(designId, sessionId));
}

/** Saves the wound turns and the measured winding length as a new revision of the design, once per session. */
export async function adoptWindingSession(u: SessionUser, designId: string, sessionId: string, body: z.output<typeof windingAdoptBodySchema>): Promise<WindingAdoptResponse> {
  const { row } = await authorize(designId, u, 'write');
  const s = await sessionRow(designId, sessionId);
  if (s.status !== 'finished' || s.woundTurns === null || s.windingLength === null) throw new ApiError('conflict', 'Finish the session before adopting what was wound.');
  if (s.adoptedRevision !== null) throw new ApiError('conflict', `This session was already adopted into revision ${s.adoptedRevision}.`);
  const input = row.design as Record<string, unknown> & { secondary?: Record<string, unknown> };
  const { windingLength: _planned, ...secondary } = input.secondary ?? {};
  // A measured length at or below turns × insulated diameter is a close-wound winding read a little short:
  // it is adopted as close-wound (the solver's turns × insulated diameter), never as an impossible length.
  const closeWound = s.windingLength <= s.woundTurns * s.insulatedDiameter * (1 + 1e-9);
  const lengthText = `${(Math.ceil(s.windingLength * 1e5) / 100).toFixed(2)} mm`;
  const design = { ...input, secondary: closeWound ? { ...secondary, turns: s.woundTurns } : { ...secondary, turns: s.woundTurns, windingLength: lengthText } };
  const saved = await updateDesign(u, designId, {
    design,
    revision: body?.revision ?? row.revision,
    message:
      body?.message ??
      `As wound: ${s.woundTurns} turns over ${(s.windingLength * 1000).toFixed(1)} mm${closeWound ? ', close-wound' : ''} (winding session of ${s.startedAt.toISOString().slice(0, 10)})`,
  });
  await database().update(windingSessions).set({ adoptedRevision: saved.revision }).where(eq(windingSessions.id, sessionId));
  return { session: await oneView(await sessionRow(designId, sessionId)), design: saved };
}

/** The finishing checklist of a session: ends fastened, coats and drying time. */
export async function putWindingChecklist(u: SessionUser, designId: string, sessionId: string, b: z.output<typeof windingChecklistBodySchema>): Promise<WindingSession> {
  await authorize(designId, u, 'write');
  const s = await sessionRow(designId, sessionId);
  const db = database();
  const old = await db.query.windingChecklists.findFirst({ where: eq(windingChecklists.sessionId, sessionId) });
  const next = {
    baseEndFastened: b.baseEndFastened ?? old?.baseEndFastened ?? false,
    topEndFastened: b.topEndFastened ?? old?.topEndFastened ?? false,
    coating: b.coating === undefined ? (old?.coating ?? null) : b.coating || null,
    coats: b.coats === undefined ? (old?.coats ?? null) : b.coats,
    dryingHours: b.dryingHours === undefined ? (old?.dryingHours ?? null) : b.dryingHours,
    notes: b.notes === undefined ? (old?.notes ?? null) : b.notes || null,
  };
  await db.insert(windingChecklists).values({ sessionId, ...next }).onConflictDoUpdate({ target: windingChecklists.sessionId, set: { ...next, updatedAt: new Date() } });
  return oneView(s);
}
