import { and, asc, eq } from 'drizzle-orm';
import { database } from './database';
import { designs, designMembers, user } from '../db/schema';
import { designCan } from '../../lib/permissions';
import type { Person, TransferBody, TransferResponse, UpdateMemberBody, UpdateMemberResponse } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize } from './access';

/** The owner first, then members by when they joined. Addresses only for those who manage the people. */
export async function listMembers(u: SessionUser, designId: string): Promise<Person[]> {
  const db = database();
  const { row, role } = await authorize(designId, u, 'read');
  const showEmail = designCan(role, 'manage-members') || role === 'admin';
  const owner = await db.query.user.findFirst({ where: eq(user.id, row.ownerId) });
  const rows = await db
    .select({ m: designMembers, name: user.name, email: user.email })
    .from(designMembers)
    .innerJoin(user, eq(designMembers.userId, user.id))
    .where(eq(designMembers.designId, designId))
    .orderBy(asc(designMembers.createdAt));
  return [
    {
      userId: row.ownerId,
      name: owner?.name ?? '',
      email: showEmail || row.ownerId === u.id ? (owner?.email ?? null) : null,
      role: 'owner',
      since: row.createdAt.toISOString(),
    },
    ...rows.map(({ m, name, email }) => ({
      userId: m.userId,
      name,
      email: showEmail || m.userId === u.id ? email : null,
      role: m.role,
      since: m.createdAt.toISOString(),
    })),
  ];
}

async function memberRow(designId: string, userId: string) {
  return database().query.designMembers.findFirst({ where: and(eq(designMembers.designId, designId), eq(designMembers.userId, userId)) });
}

export async function updateMember(u: SessionUser, designId: string, userId: string, b: UpdateMemberBody): Promise<UpdateMemberResponse> {
  const { row } = await authorize(designId, u, 'manage-members');
  if (userId === row.ownerId) throw new ApiError('validation_failed', 'The owner has no member role; transfer ownership instead.', [{ path: 'userId', message: 'This is the owner.' }]);
  const res = await database()
    .update(designMembers)
    .set({ role: b.role })
    .where(and(eq(designMembers.designId, designId), eq(designMembers.userId, userId)))
    .returning({ userId: designMembers.userId });
  if (res.length === 0) throw new ApiError('not_found', 'This person is not a member of the design.');
  return { userId, role: b.role };
}

/** The owner removes anyone; a member may also remove themselves (leave the design). */
export async function removeMember(u: SessionUser, designId: string, userId: string): Promise<void> {
  const leaving = userId === u.id;
  const { row } = await authorize(designId, u, leaving ? 'read' : 'manage-members');
  if (userId === row.ownerId) throw new ApiError('validation_failed', 'The owner cannot be removed; transfer ownership first.', [{ path: 'userId', message: 'This is the owner.' }]);
  const res = await database()
    .delete(designMembers)
    .where(and(eq(designMembers.designId, designId), eq(designMembers.userId, userId)))
    .returning({ userId: designMembers.userId });
  if (res.length === 0) throw new ApiError('not_found', 'This person is not a member of the design.');
}

/** Hands the design to an existing member; the old owner stays on as an editor. */
export async function transferOwnership(u: SessionUser, designId: string, b: TransferBody): Promise<TransferResponse> {
  const { row } = await authorize(designId, u, 'transfer');
  if (b.userId === row.ownerId) throw new ApiError('validation_failed', 'You already own this design.', [{ path: 'userId', message: 'This is already the owner.' }]);
  const target = await memberRow(designId, b.userId);
  if (!target) throw new ApiError('validation_failed', 'Only a member of the design can become its owner; invite them first.', [{ path: 'userId', message: 'Not a member of this design.' }]);
  await database().transaction(async (tx) => {
    await tx.delete(designMembers).where(and(eq(designMembers.designId, designId), eq(designMembers.userId, b.userId)));
    await tx.update(designs).set({ ownerId: b.userId }).where(eq(designs.id, designId));
    await tx.insert(designMembers).values({ designId, userId: row.ownerId, role: 'editor' });
  });
  return { ownerId: b.userId, previousOwner: { userId: row.ownerId, role: 'editor' } };
}
