import { z } from 'zod';
import { timestampSchema } from './common';
import { memberRoleSchema } from './members';

/** POST /api/v1/designs/:id/invitations */
export const createInvitationBodySchema = z.object({
  email: z.email({ error: 'Enter a valid e-mail address.' }).trim().toLowerCase().max(254, 'Enter a valid e-mail address.'),
  role: memberRoleSchema,
});

/** → 201 */
export const invitationSchema = z.object({ id: z.string(), email: z.string(), role: memberRoleSchema, createdAt: timestampSchema });

/** GET /api/v1/designs/:id/invitations: open (not yet accepted) invitations, newest first. */
export const invitationListItemSchema = invitationSchema.extend({ expired: z.boolean() });
export const invitationListResponseSchema = z.object({ invitations: z.array(invitationListItemSchema) });

/** GET /api/v1/invitations/:token, without sign-in. */
export const invitationDescriptionSchema = z.object({
  designName: z.string(),
  role: memberRoleSchema,
  email: z.string(),
  invitedBy: z.string().nullable(),
});

/** POST /api/v1/invitations/:token/accept */
export const acceptInvitationResponseSchema = z.object({ designId: z.string(), name: z.string(), role: memberRoleSchema });

export type CreateInvitationBody = z.input<typeof createInvitationBodySchema>;
export type Invitation = z.infer<typeof invitationSchema>;
export type InvitationListItem = z.infer<typeof invitationListItemSchema>;
export type InvitationListResponse = z.infer<typeof invitationListResponseSchema>;
export type InvitationDescription = z.infer<typeof invitationDescriptionSchema>;
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponseSchema>;
