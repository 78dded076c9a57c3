import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { database, preparedPerDatabase } from './database';
import { designRevisions, groupMembers, reviewFindings, reviews, user } from '../db/schema';
import type { decideReviewBodySchema, ReviewListItem, ReviewRecord, requestReviewBodySchema } from '../../lib/api/contracts';
import { firstLightChecklist } from '../../lib/review/checklist';
import { reviewStatus, type ReviewStatus } from '../../lib/review/status';
import { groupCanReview } from '../../lib/permissions';
import { toSessionUser, type SessionUser } from '../session';
import { ApiError } from '../http';
import { actionMail, sendMail } from '../mail';
import { authorize, roleOn, type DesignRow } from './access';

type ReviewRow = typeof reviews.$inferSelect;

const requester = alias(user, 'requester');
const named = alias(user, 'named_reviewer');
const decider = alias(user, 'decider');

/** The reviews of one design with the names of the people in them (read on every design page). */
const reviewsQuery = preparedPerDatabase((db) =>
  db
    .select({ r: reviews, requester: requester.name, named: named.name, decider: decider.name })
    .from(reviews)
    .leftJoin(requester, eq(reviews.requestedBy, requester.id))
    .leftJoin(named, eq(reviews.reviewerId, named.id))
    .leftJoin(decider, eq(reviews.decidedBy, decider.id))
    .where(eq(reviews.designId, sql.placeholder('designId')))
    .orderBy(desc(reviews.requestedAt))
    .prepare(),
);

/** Every review of a design already authorized, newest first; `current` is false once the design has moved on. */
export async function reviewsOf(designId: string, currentRevision: number): Promise<ReviewListItem[]> {
  const rows = await reviewsQuery(database()).all({ designId });
  return rows.map(({ r, requester: req, named: nm, decider: dec }) => ({
    id: r.id,
    revision: r.revision,
    state: r.state,
    reviewer: dec ?? nm ?? null,
    reviewerId: r.decidedBy ?? r.reviewerId,
    askedOf: r.reviewerId ? 'reviewer' : 'supervisors',
    requestedBy: req ?? 'former member',
    requestedById: r.requestedBy,
    requestedAt: r.requestedAt.toISOString(),
    decidedAt: r.decidedAt?.toISOString() ?? null,
    current: r.revision === currentRevision,
    note: r.decisionNote ?? r.requestNote ?? null,
  }));
}

export async function listReviews(u: SessionUser, designId: string): Promise<ReviewListItem[]> {
  const { row } = await authorize(designId, u, 'read');
  return reviewsOf(designId, row.revision);
}

/** The one-line first-light state of a design already authorized. */
export async function reviewStatusOf(designId: string, currentRevision: number): Promise<ReviewStatus> {
  return reviewStatus(await reviewsOf(designId, currentRevision), currentRevision);
}

/** Who may decide a review: the named reviewer, or else the supervisors of the design's group; never the requester. */
async function deciders(row: DesignRow, r: Pick<ReviewRow, 'reviewerId' | 'requestedBy'>): Promise<Array<{ id: string; name: string; email: string }>> {
  const db = database();
  let people: Array<{ id: string; name: string; email: string }>;
  if (r.reviewerId) {
    people = await db.select({ id: user.id, name: user.name, email: user.email }).from(user).where(eq(user.id, r.reviewerId));
  } else if (row.groupId) {
    people = await db
      .select({ id: user.id, name: user.name, email: user.email })
      .from(groupMembers)
      .innerJoin(user, eq(groupMembers.userId, user.id))
      .where(and(eq(groupMembers.groupId, row.groupId), eq(groupMembers.role, 'supervisor')));
  } else people = [];
  return people.filter((p) => p.id !== r.requestedBy);
}

/** Whether `u` may decide review `r` on this design now (roles are read afresh each time). */
async function mayDecide(u: SessionUser, designId: string, r: ReviewRow): Promise<boolean> {
  if (r.requestedBy === u.id) return false;
  const access = await roleOn(designId, u);
  if (!access || access.via === 'site') return false;
  if (r.reviewerId) return r.reviewerId === u.id;
  return groupCanReview(access.groupRole);
}

async function revisionDesign(designId: string, revision: number) {
  return database().query.designRevisions.findFirst({ where: and(eq(designRevisions.designId, designId), eq(designRevisions.revision, revision)) });
}

/** The owner or an editor asks for a first-light review of one revision. One open request per design at a time. */
export async function requestReview(u: SessionUser, designId: string, b: z.output<typeof requestReviewBodySchema>, origin: string): Promise<ReviewListItem> {
  const db = database();
  const { row } = await authorize(designId, u, 'write');
  if (!(await revisionDesign(designId, b.revision))) throw new ApiError('validation_failed', 'There is no such revision of this design.', [{ path: 'revision', message: `Revision ${b.revision} does not exist.` }]);
  if (b.reviewerId) {
    if (b.reviewerId === u.id) throw new ApiError('validation_failed', 'You cannot review your own request; choose someone else.', [{ path: 'reviewerId', message: 'Choose someone other than yourself.' }]);
    const other = await db.query.user.findFirst({ where: eq(user.id, b.reviewerId) });
    const access = other ? await roleOn(designId, toSessionUser(other)) : null;
    if (!access || access.via === 'site') throw new ApiError('validation_failed', 'The reviewer must be someone who works on this design.', [{ path: 'reviewerId', message: 'Not one of the people on this design.' }]);
  }
  const people = await deciders(row, { reviewerId: b.reviewerId ?? null, requestedBy: u.id });
  if (people.length === 0) {
    const message = row.groupId ? 'The design’s group has no supervisor other than you; name a reviewer.' : 'The design is in no group; name a reviewer, or put the design in a group with a supervisor.';
    throw new ApiError('validation_failed', message, [{ path: 'reviewerId', message: 'Choose a reviewer.' }]);
  }
  const open = await db.query.reviews.findFirst({ where: and(eq(reviews.designId, designId), eq(reviews.state, 'requested')) });
  if (open) throw new ApiError('conflict', `A review of revision ${open.revision} is waiting already; it must be decided first.`);
  const id = randomUUID();
  await db.insert(reviews).values({ id, designId, revision: b.revision, requestedBy: u.id, reviewerId: b.reviewerId ?? null, requestNote: b.note || null });
  const url = `${origin}/designs/${designId}/review?review=${id}`;
  for (const p of people) {
    await sendMail(
      actionMail(
        p.email,
        `First-light review requested: “${row.name}” revision ${b.revision}`,
        [
          `Hello ${p.name},`,
          `${u.name || u.email} asks you to review revision ${b.revision} of the coil design “${row.name}” before it is first powered.`,
          ...(b.note ? [`Their note: ${b.note}`] : []),
          'The checklist is generated from the design; record a finding for each item, then sign it off or ask for changes.',
        ],
        { label: 'Open the checklist', url },
      ),
    );
  }
  return (await reviewsOf(designId, row.revision)).find((r) => r.id === id)!;
}

async function reviewRow(designId: string, reviewId: string) {
  const r = await database().query.reviews.findFirst({ where: and(eq(reviews.id, reviewId), eq(reviews.designId, designId)) });
  if (!r) throw new ApiError('not_found', 'No such review.');
  return r;
}

export async function getReview(u: SessionUser, designId: string, reviewId: string): Promise<ReviewRecord> {
  const { row } = await authorize(designId, u, 'read');
  const r = await reviewRow(designId, reviewId);
  const rev = await revisionDesign(designId, r.revision);
  const checklist = firstLightChecklist(rev?.design ?? row.design);
  const findings = await database().select().from(reviewFindings).where(eq(reviewFindings.reviewId, reviewId));
  const order = new Map(checklist.items.map((it, i) => [it.key, i]));
  const item = (await reviewsOf(designId, row.revision)).find((x) => x.id === reviewId)!;
  return {
    ...item,
    family: checklist.family,
    checklist: checklist.items,
    findings: findings.map((f) => ({ item: f.item, status: f.status, note: f.note })).sort((a, b) => (order.get(a.item) ?? 99) - (order.get(b.item) ?? 99)),
    canDecide: r.state === 'requested' && (await mayDecide(u, designId, r)),
  };
}

/**
 * Records the findings and the decision. Signing off needs every item checked (or marked as not applying);
 * asking for changes needs at least one item that needs a change. The requester never decides their own request.
 */
export async function decideReview(u: SessionUser, designId: string, reviewId: string, b: z.output<typeof decideReviewBodySchema>, origin: string): Promise<ReviewRecord> {
  const { row } = await authorize(designId, u, 'read');
  const r = await reviewRow(designId, reviewId);
  if (r.requestedBy === u.id) throw new ApiError('forbidden', 'You asked for this review, so someone else must decide it.');
  if (!(await mayDecide(u, designId, r))) throw new ApiError('forbidden', 'Only the reviewer named in the request, or a supervisor of the design’s group, can decide this review.');
  if (r.state !== 'requested') throw new ApiError('conflict', 'This review was decided already; ask for a new one.');
  const rev = await revisionDesign(designId, r.revision);
  const checklist = firstLightChecklist(rev?.design ?? row.design);
  const keys = new Set(checklist.items.map((i) => i.key));
  const issues: Array<{ path: string; message: string }> = [];
  const seen = new Set<string>();
  b.findings.forEach((f, i) => {
    if (!keys.has(f.item)) issues.push({ path: `findings.${i}.item`, message: 'Not an item of this checklist.' });
    else if (seen.has(f.item)) issues.push({ path: `findings.${i}.item`, message: 'This item has a finding already.' });
    seen.add(f.item);
    if (f.status === 'change' && !f.note) issues.push({ path: `findings.${i}.note`, message: 'Say what needs to change.' });
  });
  if (b.decision === 'signed_off') {
    const byKey = new Map(b.findings.map((f) => [f.item, f.status]));
    for (const it of checklist.items) {
      const s = byKey.get(it.key);
      if (!s) issues.push({ path: 'findings', message: `${it.title}: not checked yet.` });
      else if (s === 'change') issues.push({ path: 'findings', message: `${it.title}: needs a change, so the coil cannot be signed off.` });
    }
  } else if (!b.findings.some((f) => f.status === 'change')) {
    issues.push({ path: 'findings', message: 'Mark at least one item that needs a change.' });
  }
  if (issues.length) throw new ApiError('validation_failed', b.decision === 'signed_off' ? 'The checklist is not complete.' : 'Some findings need attention.', issues);
  const decided = await database().transaction(async (tx) => {
    const claimed = await tx
      .update(reviews)
      .set({ state: b.decision, decidedBy: u.id, decidedAt: new Date(), decisionNote: b.note || null })
      .where(and(eq(reviews.id, reviewId), eq(reviews.state, 'requested')))
      .returning({ id: reviews.id });
    if (claimed.length === 0) return false;
    if (b.findings.length) await tx.insert(reviewFindings).values(b.findings.map((f) => ({ reviewId, item: f.item, status: f.status, note: f.note })));
    return true;
  });
  if (!decided) throw new ApiError('conflict', 'This review was decided already; ask for a new one.');
  await mailDecision(u, row, r, b, origin);
  return getReview(u, designId, reviewId);
}

async function mailDecision(u: SessionUser, row: DesignRow, r: ReviewRow, b: z.output<typeof decideReviewBodySchema>, origin: string) {
  const ids = [...new Set([r.requestedBy, row.ownerId].filter((x): x is string => !!x && x !== u.id))];
  if (!ids.length) return;
  const to = await database().select({ name: user.name, email: user.email }).from(user).where(inArray(user.id, ids));
  const signed = b.decision === 'signed_off';
  const changes = b.findings.filter((f) => f.status === 'change');
  const titles = new Map(firstLightChecklist((await revisionDesign(row.id, r.revision))?.design ?? row.design).items.map((i) => [i.key, i.title]));
  for (const p of to) {
    await sendMail(
      actionMail(
        p.email,
        signed ? `Signed off for first light: “${row.name}” revision ${r.revision}` : `Changes requested: “${row.name}” revision ${r.revision}`,
        [
          `Hello ${p.name},`,
          signed
            ? `${u.name || u.email} signed off revision ${r.revision} of “${row.name}” for first light. The sign-off holds for that revision only: any later change needs a new review.`
            : `${u.name || u.email} asks for changes to revision ${r.revision} of “${row.name}” before first light:`,
          ...changes.map((f) => `• ${titles.get(f.item) ?? f.item}: ${f.note}`),
          ...(b.note ? [`Note: ${b.note}`] : []),
        ],
        { label: 'Open the review', url: `${origin}/designs/${row.id}/review?review=${r.id}` },
      ),
    );
  }
}
