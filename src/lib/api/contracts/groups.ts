import { z } from 'zod';
import { timestampSchema } from './common';

/**
 * Roles inside a group. A group has one admin (who manages it); supervisors are the experienced or licensed
 * people who review a coil before first light; members build.
 */
export const GROUP_ROLES = ['admin', 'member', 'supervisor'] as const;
export const groupRoleSchema = z.enum(GROUP_ROLES, { error: 'Choose admin, member or supervisor.' });
/** The roles an admin hands out; the admin role itself moves only by a transfer. */
export const GROUP_INVITE_ROLES = ['member', 'supervisor'] as const;
export const groupInviteRoleSchema = z.enum(GROUP_INVITE_ROLES, { error: 'Choose member or supervisor.' });

export const groupNameSchema = z
  .string({ error: 'Give the group a name.' })
  .trim()
  .min(1, 'Give the group a name.')
  .max(120, 'Keep the group name under 120 characters.');

/** A group's id in a path: anything else cannot name a group. */
export const groupIdParamSchema = z.string().regex(/^[A-Za-z0-9-]{8,64}$/);

/** One row of GET /api/v1/groups: a group the signed-in person belongs to, with their role in it. */
export const groupListItemSchema = z.object({ id: z.string(), name: z.string(), role: groupRoleSchema, memberCount: z.number().int().min(1) });
export const groupListResponseSchema = z.object({ groups: z.array(groupListItemSchema) });

/** POST /api/v1/groups */
export const createGroupBodySchema = z.object({ name: groupNameSchema });
/** PATCH /api/v1/groups/:groupId */
export const renameGroupBodySchema = z.object({ name: groupNameSchema });

export const groupMemberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  /** shown to the group's admin and to each person for themselves; otherwise null */
  email: z.string().nullable(),
  role: groupRoleSchema,
  since: timestampSchema,
});

/** GET /api/v1/groups/:groupId: members see it; a site admin reads it with `role: null`. */
export const groupRecordSchema = z.object({
  id: z.string(),
  name: z.string(),
  role: groupRoleSchema.nullable(),
  createdAt: timestampSchema,
  members: z.array(groupMemberSchema),
});

/** POST /api/v1/groups/:groupId/invitations */
export const createGroupInvitationBodySchema = z.object({
  email: z.email({ error: 'Enter a valid e-mail address.' }).trim().toLowerCase().max(254, 'Enter a valid e-mail address.'),
  role: groupInviteRoleSchema,
});
export const groupInvitationSchema = z.object({ id: z.string(), email: z.string(), role: groupInviteRoleSchema, createdAt: timestampSchema });
export const groupInvitationListItemSchema = groupInvitationSchema.extend({ expired: z.boolean() });
export const groupInvitationListResponseSchema = z.object({ invitations: z.array(groupInvitationListItemSchema) });

/** GET /api/v1/group-invitations/:token, without sign-in. */
export const groupInvitationDescriptionSchema = z.object({
  groupName: z.string(),
  role: groupInviteRoleSchema,
  email: z.string(),
  invitedBy: z.string().nullable(),
});
/** POST /api/v1/group-invitations/:token/accept */
export const acceptGroupInvitationResponseSchema = z.object({ groupId: z.string(), name: z.string(), role: groupRoleSchema });

/** PATCH /api/v1/groups/:groupId/members/:userId */
export const updateGroupMemberBodySchema = z.object({ role: groupInviteRoleSchema });
export const updateGroupMemberResponseSchema = z.object({ userId: z.string(), role: groupInviteRoleSchema });

/** POST /api/v1/groups/:groupId/transfer: the named member becomes the admin; the old admin stays as a member. */
export const transferGroupBodySchema = z.object({
  userId: z.string({ error: 'Name the member who becomes the admin.' }).min(1, 'Name the member who becomes the admin.'),
});
export const transferGroupResponseSchema = z.object({ adminId: z.string(), previousAdmin: z.object({ userId: z.string(), role: z.literal('member') }) });

/** PUT /api/v1/designs/:id/group: null takes the design out of its group. */
export const setDesignGroupBodySchema = z.object({
  groupId: z.string({ error: 'Choose a group, or none.' }).min(1, 'Choose a group, or none.').nullable(),
});
/** GET and PUT /api/v1/designs/:id/group: the design's group and who reaches the design through it. */
export const designGroupResponseSchema = z.object({
  groupId: z.string().nullable(),
  groupName: z.string().nullable(),
  members: z.array(z.object({ userId: z.string(), name: z.string(), groupRole: groupRoleSchema, designRole: z.literal('editor'), reviews: z.boolean() })),
});

export type GroupRole = z.infer<typeof groupRoleSchema>;
export type GroupInviteRole = z.infer<typeof groupInviteRoleSchema>;
export type GroupListItem = z.infer<typeof groupListItemSchema>;
export type GroupListResponse = z.infer<typeof groupListResponseSchema>;
export type GroupMember = z.infer<typeof groupMemberSchema>;
export type GroupRecord = z.infer<typeof groupRecordSchema>;
export type GroupInvitation = z.infer<typeof groupInvitationSchema>;
export type GroupInvitationListItem = z.infer<typeof groupInvitationListItemSchema>;
export type GroupInvitationListResponse = z.infer<typeof groupInvitationListResponseSchema>;
export type GroupInvitationDescription = z.infer<typeof groupInvitationDescriptionSchema>;
export type AcceptGroupInvitationResponse = z.infer<typeof acceptGroupInvitationResponseSchema>;
export type UpdateGroupMemberResponse = z.infer<typeof updateGroupMemberResponseSchema>;
export type TransferGroupResponse = z.infer<typeof transferGroupResponseSchema>;
export type DesignGroupResponse = z.infer<typeof designGroupResponseSchema>;
