import { z } from 'zod';
import { timestampSchema } from './common';

/** The roles an owner hands out; "owner" itself changes only by a transfer. */
export const MEMBER_ROLES = ['editor', 'viewer'] as const;
export const memberRoleSchema = z.enum(MEMBER_ROLES, { error: 'Choose editor or viewer.' });

/** One person on GET /api/v1/designs/:id/members: the owner first, then members by when they joined. */
export const personSchema = z.object({
  userId: z.string(),
  name: z.string(),
  /** shown to the owner and admins, and to each person for themselves; otherwise null */
  email: z.string().nullable(),
  role: z.enum(['owner', ...MEMBER_ROLES]),
  since: timestampSchema,
});

export const membersResponseSchema = z.object({ members: z.array(personSchema) });

/** PATCH /api/v1/designs/:id/members/:userId */
export const updateMemberBodySchema = z.object({ role: memberRoleSchema });
export const updateMemberResponseSchema = z.object({ userId: z.string(), role: memberRoleSchema });

/** POST /api/v1/designs/:id/transfer */
export const transferBodySchema = z.object({
  userId: z.string({ error: 'Name the member who becomes the owner.' }).min(1, 'Name the member who becomes the owner.'),
});
export const transferResponseSchema = z.object({
  ownerId: z.string(),
  previousOwner: z.object({ userId: z.string(), role: z.literal('editor') }),
});

export type MemberRole = z.infer<typeof memberRoleSchema>;
export type Person = z.infer<typeof personSchema>;
export type MembersResponse = z.infer<typeof membersResponseSchema>;
export type UpdateMemberBody = z.input<typeof updateMemberBodySchema>;
export type UpdateMemberResponse = z.infer<typeof updateMemberResponseSchema>;
export type TransferBody = z.input<typeof transferBodySchema>;
export type TransferResponse = z.infer<typeof transferResponseSchema>;
