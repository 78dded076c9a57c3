import { and, asc, count, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { randomBytes, randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { database } from './database';
import { designs, groupInvitations, groupMembers, groups, user } from '../db/schema';
import type {
  AcceptGroupInvitationResponse,
  createGroupInvitationBodySchema,
  DesignGroupResponse,
  GroupInvitation,
  GroupInvitationDescription,
  GroupInvitationListItem,
  GroupListItem,
  GroupRecord,
  GroupRole,
  TransferGroupResponse,
  UpdateGroupMemberResponse,
} from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { actionMail, sendMail } from '../mail';
import { authorize } from './access';
import { groupCanReview } from '../../lib/permissions';
import { hashToken, INVITATION_LIFETIME_MS, tokenShape } from './invitations';

type GroupRow = typeof groups.$inferSelect;

const noGroup = () => new ApiError('not_found', 'No such group.');

async function membership(groupId: string, userId: string) {
  return database().query.groupMembers.findFirst({ where: and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)) });
}

/**
 * Loads a group for the caller. Members read it; site admins read it too (with no role); changes are the group
 * admin's. Anyone else learns nothing (404).
 */
async function openGroup(groupId: string, u: SessionUser, need: 'read' | 'manage'): Promise<{ group: GroupRow; role: GroupRole | null }> {
  const group = await database().query.groups.findFirst({ where: eq(groups.id, groupId) });
  if (!group) throw noGroup();
  const m = await membership(groupId, u.id);
  if (!m && u.role !== 'admin') throw noGroup();
  const role = m?.role ?? null;
  if (need === 'manage' && role !== 'admin') throw new ApiError('forbidden', 'Only the group’s admin can do this.');
  return { group, role };
}

/** The caller's groups with their role in each, by name. */
export async function listGroups(u: SessionUser): Promise<GroupListItem[]> {
  const db = database();
  const mine = await db
    .select({ id: groups.id, name: groups.name, role: groupMembers.role })
    .from(groupMembers)
    .innerJoin(groups, eq(groupMembers.groupId, groups.id))
    .where(eq(groupMembers.userId, u.id))
    .orderBy(asc(groups.name));
  if (mine.length === 0) return [];
  const counts = await db
    .select({ groupId: groupMembers.groupId, n: count() })
    .from(groupMembers)
    .where(inArray(groupMembers.groupId, mine.map((g) => g.id)))
    .groupBy(groupMembers.groupId);
  const n = new Map(counts.map((c) => [c.groupId, c.n]));
  return mine.map((g) => ({ ...g, memberCount: n.get(g.id) ?? 1 }));
}

/** A new group with the caller as its admin. */
export async function createGroup(u: SessionUser, name: string): Promise<GroupListItem> {
  const id = randomUUID();
  await database().transaction(async (tx) => {
    await tx.insert(groups).values({ id, name, createdBy: u.id });
    await tx.insert(groupMembers).values({ groupId: id, userId: u.id, role: 'admin' });
  });
  return { id, name, role: 'admin', memberCount: 1 };
}

export async function getGroup(u: SessionUser, groupId: string): Promise<GroupRecord> {
  const { group, role } = await openGroup(groupId, u, 'read');
  const rows = await database()
    .select({ m: groupMembers, name: user.name, email: user.email })
    .from(groupMembers)
    .innerJoin(user, eq(groupMembers.userId, user.id))
    .where(eq(groupMembers.groupId, groupId))
    .orderBy(asc(groupMembers.createdAt));
  const showEmail = role === 'admin' || u.role === 'admin';
  const order: Record<GroupRole, number> = { admin: 0, supervisor: 1, member: 2 };
  return {
    id: group.id,
    name: group.name,
    role,
    createdAt: group.createdAt.toISOString(),
    members: rows
      .map(({ m, name, email }) => ({ userId: m.userId, name, email: showEmail || m.userId === u.id ? email : null, role: m.role, since: m.createdAt.toISOString() }))
      .sort((a, b) => order[a.role] - order[b.role]),
  };
}

export async function renameGroup(u: SessionUser, groupId: string, name: string): Promise<GroupListItem> {
  const { role } = await openGroup(groupId, u, 'manage');
  await database().update(groups).set({ name }).where(eq(groups.id, groupId));
  const [{ n }] = await database().select({ n: count() }).from(groupMembers).where(eq(groupMembers.groupId, groupId));
  return { id: groupId, name, role: role!, memberCount: n };
}

/** Deletes a group: its designs stay with their owners, out of any group; members and open invitations go. */
export async function deleteGroup(u: SessionUser, groupId: string): Promise<void> {
  await openGroup(groupId, u, 'manage');
  await database().transaction(async (tx) => {
    await tx.update(designs).set({ groupId: null }).where(eq(designs.groupId, groupId));
    await tx.delete(groups).where(eq(groups.id, groupId));
  });
}

const roleWords: Record<'member' | 'supervisor', string> = {
  member: 'a member: you will be able to open and edit the group’s coil designs',
  supervisor: 'a supervisor: you will be able to open and edit the group’s coil designs and sign them off for first light',
};

/** Invites by e-mail; the link is single-use and expires like a design invitation. Only a confirmed address may invite. */
export async function inviteToGroup(u: SessionUser, groupId: string, b: z.output<typeof createGroupInvitationBodySchema>, origin: string): Promise<GroupInvitation> {
  const db = database();
  const { group } = await openGroup(groupId, u, 'manage');
  if (!u.emailVerified) throw new ApiError('email_not_verified');
  const invitee = await db.query.user.findFirst({ where: sql`lower(${user.email}) = ${b.email}` });
  if (invitee && (await membership(groupId, invitee.id))) {
    throw new ApiError('conflict', 'This person is in the group already; change their role in the member list.', [{ path: 'email', message: 'Already in this group.' }]);
  }
  const token = randomBytes(24).toString('base64url'); // 192 bits; only its hash is stored
  const id = randomUUID();
  await db.insert(groupInvitations).values({ id, groupId, email: b.email, role: b.role, tokenHash: hashToken(token), invitedBy: u.id });
  await sendMail(
    actionMail(
      b.email,
      `Invitation to the group “${group.name}”`,
      [
        `${u.name || u.email} invites you to the group “${group.name}” on Coilwright as ${roleWords[b.role]}.`,
        'Open the link to accept. If you have no Coilwright account yet, you can make one on the way; the link works for two weeks.',
        'If you did not expect this, ignore the message: nothing happens unless you accept.',
      ],
      { label: 'Join the group', url: `${origin}/group-invitations/${token}` },
    ),
  );
  return { id, email: b.email, role: b.role, createdAt: new Date().toISOString() };
}

export async function listGroupInvitations(u: SessionUser, groupId: string): Promise<GroupInvitationListItem[]> {
  await openGroup(groupId, u, 'manage');
  const rows = await database()
    .select()
    .from(groupInvitations)
    .where(and(eq(groupInvitations.groupId, groupId), isNull(groupInvitations.acceptedAt)))
    .orderBy(desc(groupInvitations.createdAt));
  const now = Date.now();
  return rows.map((i) => ({ id: i.id, email: i.email, role: i.role, createdAt: i.createdAt.toISOString(), expired: now - i.createdAt.getTime() > INVITATION_LIFETIME_MS }));
}

export async function withdrawGroupInvitation(u: SessionUser, groupId: string, invitationId: string): Promise<void> {
  await openGroup(groupId, u, 'manage');
  const res = await database()
    .delete(groupInvitations)
    .where(and(eq(groupInvitations.groupId, groupId), eq(groupInvitations.id, invitationId), isNull(groupInvitations.acceptedAt)))
    .returning({ id: groupInvitations.id });
  if (res.length === 0) throw new ApiError('not_found', 'No such open invitation.');
}

const gone = () => new ApiError('not_found', 'This invitation does not exist, was withdrawn, was already used or has expired.');

async function openGroupInvitation(token: string) {
  const db = database();
  if (!tokenShape.test(token)) throw gone();
  const inv = await db.query.groupInvitations.findFirst({ where: eq(groupInvitations.tokenHash, hashToken(token)) });
  if (!inv || inv.acceptedAt || Date.now() - inv.createdAt.getTime() > INVITATION_LIFETIME_MS) throw gone();
  const group = await db.query.groups.findFirst({ where: eq(groups.id, inv.groupId) });
  if (!group) throw gone();
  return { inv, group };
}

export async function describeGroupInvitation(token: string): Promise<GroupInvitationDescription> {
  const { inv, group } = await openGroupInvitation(token);
  const inviter = inv.invitedBy ? await database().query.user.findFirst({ where: eq(user.id, inv.invitedBy) }) : undefined;
  return { groupName: group.name, role: inv.role, email: inv.email, invitedBy: inviter?.name ?? null };
}

/** Joins the group with the invited role; single-use. The group's admin keeps the admin role. */
export async function acceptGroupInvitation(u: SessionUser, token: string): Promise<AcceptGroupInvitationResponse> {
  const { inv, group } = await openGroupInvitation(token);
  const existing = await membership(group.id, u.id);
  if (existing?.role === 'admin') throw new ApiError('conflict', 'You are this group’s admin already.');
  // The link is for the person it was mailed to: a forwarded link cannot be used by another account.
  if (u.email.trim().toLowerCase() !== inv.email.trim().toLowerCase()) {
    throw new ApiError('forbidden', 'This invitation was sent to another e-mail address. Sign in with the address it was sent to, or ask the group’s admin to invite this account.');
  }
  const done = await database().transaction(async (tx) => {
    const claimed = await tx
      .update(groupInvitations)
      .set({ acceptedAt: new Date(), acceptedBy: u.id })
      .where(and(eq(groupInvitations.id, inv.id), isNull(groupInvitations.acceptedAt)))
      .returning({ id: groupInvitations.id });
    if (claimed.length === 0) return false;
    await tx
      .insert(groupMembers)
      .values({ groupId: group.id, userId: u.id, role: inv.role })
      .onConflictDoUpdate({ target: [groupMembers.groupId, groupMembers.userId], set: { role: inv.role } });
    return true;
  });
  if (!done) throw gone();
  return { groupId: group.id, name: group.name, role: inv.role };
}

export async function setGroupMemberRole(u: SessionUser, groupId: string, userId: string, role: 'member' | 'supervisor'): Promise<UpdateGroupMemberResponse> {
  await openGroup(groupId, u, 'manage');
  const target = await membership(groupId, userId);
  if (!target) throw new ApiError('not_found', 'This person is not in the group.');
  if (target.role === 'admin') throw new ApiError('validation_failed', 'The admin keeps the admin role; hand it to someone else with a transfer.', [{ path: 'userId', message: 'This is the group’s admin.' }]);
  await database().update(groupMembers).set({ role }).where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
  return { userId, role };
}

/** The admin removes anyone else; anyone but the admin may leave. Access to the group's designs ends at once. */
export async function removeGroupMember(u: SessionUser, groupId: string, userId: string): Promise<void> {
  const leaving = userId === u.id;
  const { role } = await openGroup(groupId, u, leaving ? 'read' : 'manage');
  if (leaving && !role) throw noGroup();
  const target = await membership(groupId, userId);
  if (!target) throw new ApiError('not_found', 'This person is not in the group.');
  if (target.role === 'admin') {
    throw new ApiError('validation_failed', 'The admin cannot leave or be removed; hand the admin role to another member first, or delete the group.', [{ path: 'userId', message: 'This is the group’s admin.' }]);
  }
  await database().delete(groupMembers).where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
}

/** Hands the admin role to another member; the old admin stays as a member. */
export async function transferGroupAdmin(u: SessionUser, groupId: string, userId: string): Promise<TransferGroupResponse> {
  await openGroup(groupId, u, 'manage');
  if (userId === u.id) throw new ApiError('validation_failed', 'You are the admin already.', [{ path: 'userId', message: 'This is already the admin.' }]);
  const target = await membership(groupId, userId);
  if (!target) throw new ApiError('validation_failed', 'Only a member of the group can become its admin; invite them first.', [{ path: 'userId', message: 'Not in this group.' }]);
  await database().transaction(async (tx) => {
    await tx.update(groupMembers).set({ role: 'admin' }).where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
    await tx.update(groupMembers).set({ role: 'member' }).where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, u.id)));
  });
  return { adminId: userId, previousAdmin: { userId: u.id, role: 'member' } };
}

/** Puts a design in one of the owner's groups, or takes it out (owner only). */
export async function setDesignGroup(u: SessionUser, designId: string, groupId: string | null): Promise<DesignGroupResponse> {
  await authorize(designId, u, 'transfer');
  if (groupId) {
    const group = await database().query.groups.findFirst({ where: eq(groups.id, groupId) });
    if (!group || !(await membership(groupId, u.id))) {
      throw new ApiError('validation_failed', 'Choose one of your own groups.', [{ path: 'groupId', message: 'You are not in this group.' }]);
    }
  }
  await database().update(designs).set({ groupId }).where(eq(designs.id, designId));
  return designGroupOf(groupId);
}

export async function getDesignGroup(u: SessionUser, designId: string): Promise<DesignGroupResponse> {
  const { row } = await authorize(designId, u, 'read');
  return designGroupOf(row.groupId);
}

/** A design's group (of a design already authorized) and the people who reach the design through it. */
export async function designGroupOf(groupId: string | null): Promise<DesignGroupResponse> {
  if (!groupId) return { groupId: null, groupName: null, members: [] };
  const g = await database().query.groups.findFirst({ where: eq(groups.id, groupId) });
  if (!g) return { groupId: null, groupName: null, members: [] };
  const people = await groupPeople(groupId);
  return {
    groupId,
    groupName: g.name,
    members: people.map((p) => ({ userId: p.userId, name: p.name, groupRole: p.role, designRole: 'editor' as const, reviews: groupCanReview(p.role) })),
  };
}

/** The people of a group with a given role, for mail and the people page. */
export async function groupPeople(groupId: string) {
  return database()
    .select({ userId: groupMembers.userId, role: groupMembers.role, name: user.name, email: user.email, since: groupMembers.createdAt })
    .from(groupMembers)
    .innerJoin(user, eq(groupMembers.userId, user.id))
    .where(eq(groupMembers.groupId, groupId))
    .orderBy(asc(groupMembers.createdAt));
}
