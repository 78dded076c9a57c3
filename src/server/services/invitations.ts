import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { database } from './database';
import { designs, designInvitations, designMembers, user } from '../db/schema';
import type { AcceptInvitationResponse, createInvitationBodySchema, Invitation, InvitationDescription, InvitationListItem } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { actionMail, sendMail } from '../mail';
import { authorize } from './access';

/** An invitation link stays valid for two weeks; after that the owner sends a new one. */
export const INVITATION_LIFETIME_MS = 14 * 24 * 3600 * 1000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export const tokenShape = /^[A-Za-z0-9_-]{16,64}$/;

export async function createInvitation(u: SessionUser, designId: string, b: z.output<typeof createInvitationBodySchema>, origin: string): Promise<Invitation> {
  const db = database();
  const { row } = await authorize(designId, u, 'invite');
  if (!u.emailVerified) throw new ApiError('email_not_verified');
  const invitee = await db.query.user.findFirst({ where: sql`lower(${user.email}) = ${b.email}` });
  if (invitee) {
    const already = invitee.id === row.ownerId || (await db.query.designMembers.findFirst({ where: and(eq(designMembers.designId, designId), eq(designMembers.userId, invitee.id)) }));
    if (already) throw new ApiError('conflict', 'This person already has a role on the design; change it on the People page.', [{ path: 'email', message: 'Already has a role on this design.' }]);
  }
  const token = randomBytes(24).toString('base64url'); // 192 bits; only its hash is stored
  const id = randomUUID();
  await db.insert(designInvitations).values({ id, designId, email: b.email, role: b.role, tokenHash: hashToken(token), invitedBy: u.id });
  const url = `${origin}/invitations/${token}`;
  const roleWords = b.role === 'editor' ? 'edit it and save revisions' : 'read it';
  await sendMail(
    actionMail(
      b.email,
      `Invitation to the coil design “${row.name}”`,
      [
        `${u.name || u.email} invites you to work on the coil design “${row.name}” on Coilwright as ${b.role === 'editor' ? 'an editor' : 'a viewer'}: you will be able to ${roleWords}.`,
        'Open the link to accept. If you have no Coilwright account yet, you can make one on the way; the link works for two weeks.',
        'If you did not expect this, ignore the message: nothing happens unless you accept.',
      ],
      { label: 'Accept the invitation', url },
    ),
  );
  return { id, email: b.email, role: b.role, createdAt: new Date().toISOString() };
}

export async function listInvitations(u: SessionUser, designId: string): Promise<InvitationListItem[]> {
  await authorize(designId, u, 'invite');
  const rows = await database()
    .select()
    .from(designInvitations)
    .where(and(eq(designInvitations.designId, designId), isNull(designInvitations.acceptedAt)))
    .orderBy(desc(designInvitations.createdAt));
  const now = Date.now();
  return rows.map((i) => ({
    id: i.id,
    email: i.email,
    role: i.role,
    createdAt: i.createdAt.toISOString(),
    expired: now - i.createdAt.getTime() > INVITATION_LIFETIME_MS,
  }));
}

export async function revokeInvitation(u: SessionUser, designId: string, invitationId: string): Promise<void> {
  await authorize(designId, u, 'invite');
  const res = await database()
    .delete(designInvitations)
    .where(and(eq(designInvitations.designId, designId), eq(designInvitations.id, invitationId), isNull(designInvitations.acceptedAt)))
    .returning({ id: designInvitations.id });
  if (res.length === 0) throw new ApiError('not_found', 'No such open invitation.');
}

const gone = () => new ApiError('not_found', 'This invitation does not exist, was withdrawn, was already used or has expired.');

async function openInvitation(token: string) {
  const db = database();
  if (!tokenShape.test(token)) throw gone();
  const inv = await db.query.designInvitations.findFirst({ where: eq(designInvitations.tokenHash, hashToken(token)) });
  if (!inv || inv.acceptedAt || Date.now() - inv.createdAt.getTime() > INVITATION_LIFETIME_MS) throw gone();
  const d = await db.query.designs.findFirst({ where: eq(designs.id, inv.designId) });
  if (!d) throw gone();
  return { inv, d };
}

/** What the accept page shows: the design's name, the role and who invited; the token itself is the proof. */
export async function describeInvitation(token: string): Promise<InvitationDescription> {
  const { inv, d } = await openInvitation(token);
  const inviter = inv.invitedBy ? await database().query.user.findFirst({ where: eq(user.id, inv.invitedBy) }) : undefined;
  return { designName: d.name, role: inv.role, email: inv.email, invitedBy: inviter?.name ?? null };
}

/**
 * Adds the signed-in person to the design with the invited role. The link is single-use. A person who already
 * owns the design keeps ownership; an existing member takes the invited role.
 */
export async function acceptInvitation(u: SessionUser, token: string): Promise<AcceptInvitationResponse> {
  const { inv, d } = await openInvitation(token);
  if (d.ownerId === u.id) throw new ApiError('conflict', 'You own this design already.');
  // The link is for the person it was mailed to: a forwarded link cannot be used by another account.
  if (u.email.trim().toLowerCase() !== inv.email.trim().toLowerCase()) {
    throw new ApiError('forbidden', 'This invitation was sent to another e-mail address. Sign in with the address it was sent to, or ask the owner to invite this account.');
  }
  const done = await database().transaction(async (tx) => {
    const claimed = await tx
      .update(designInvitations)
      .set({ acceptedAt: new Date(), acceptedBy: u.id })
      .where(and(eq(designInvitations.id, inv.id), isNull(designInvitations.acceptedAt)))
      .returning({ id: designInvitations.id });
    if (claimed.length === 0) return false;
    await tx
      .insert(designMembers)
      .values({ designId: d.id, userId: u.id, role: inv.role })
      .onConflictDoUpdate({ target: [designMembers.designId, designMembers.userId], set: { role: inv.role } });
    return true;
  });
  if (!done) throw gone();
  return { designId: d.id, name: d.name, role: inv.role };
}
