import { json, media, type RouteDoc } from './openapi-types';
import {
  acceptInvitationResponseSchema,
  compareQuerySchema,
  compareResponseSchema,
  copyDesignBodySchema,
  createInvitationBodySchema,
  designFileBodySchema,
  designFileSchema,
  designRecordSchema,
  invitationDescriptionSchema,
  invitationListResponseSchema,
  invitationSchema,
  membersResponseSchema,
  restoreRevisionBodySchema,
  summaryQuerySchema,
  transferBodySchema,
  transferResponseSchema,
  updateMemberBodySchema,
  updateMemberResponseSchema,
} from '../lib/api/contracts';

const noRole = 'No such design, or no role on it (nothing about it is revealed).';
const summaryText = media('text/plain', 'The summary as text/plain, or text/markdown with format=markdown.');

/** The library, revisions, sharing and people routes, merged into /api/v1/openapi.json. */
export const libraryRoutes: RouteDoc[] = [
  { method: 'post', path: '/api/v1/designs/{id}/duplicate', summary: 'Copy a design I can read into a new design I own (revision 1). Body optional: { name }.', body: copyDesignBodySchema, bodyOptional: true, responses: { 201: json(designRecordSchema, 'The new design, role owner.'), 400: 'Invalid name, or the stored design no longer validates.', 401: 'Not signed in.', 404: noRole } },
  { method: 'post', path: '/api/v1/designs/{id}/revisions/{revision}/restore', summary: 'Save an old revision (name and design) as a new revision. Body optional: { revision: latest seen, message }.', body: restoreRevisionBodySchema, bodyOptional: true, responses: { 201: json(designRecordSchema, 'The design at its new revision.'), 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: 'No such revision, or no role on the design.', 409: 'The given revision is not the latest; nothing saved.' } },
  { method: 'get', path: '/api/v1/designs/{id}/compare', summary: 'Two revisions side by side: changed inputs and the changes in the key results.', query: compareQuerySchema, responses: { 200: json(compareResponseSchema, 'The changes.'), 400: 'from/to missing or not whole numbers.', 404: 'No such revision, or no role on the design.' } },
  { method: 'get', path: '/api/v1/designs/{id}/members', summary: 'The owner and the members with their roles (addresses shown to the owner and admins).', responses: { 200: json(membersResponseSchema, 'The people on the design.'), 401: 'Not signed in.', 404: noRole } },
  { method: 'patch', path: '/api/v1/designs/{id}/members/{userId}', summary: 'Change a member’s role (owner only).', body: updateMemberBodySchema, responses: { 200: json(updateMemberResponseSchema, 'The new role.'), 400: 'Invalid role, or the person is the owner.', 403: 'Not the owner.', 404: 'Not a member, or no role on the design.' } },
  { method: 'delete', path: '/api/v1/designs/{id}/members/{userId}', summary: 'Remove a member (owner), or leave a design (a member removing themselves).', responses: { 204: 'Removed.', 400: 'The owner cannot be removed.', 403: 'Not the owner.', 404: 'Not a member, or no role on the design.' } },
  { method: 'post', path: '/api/v1/designs/{id}/transfer', summary: 'Hand the design to an existing member; the old owner becomes an editor.', body: transferBodySchema, responses: { 200: json(transferResponseSchema, 'The new owner and the old owner’s new role.'), 400: 'The person is not a member.', 403: 'Not the owner.', 404: noRole } },
  { method: 'get', path: '/api/v1/designs/{id}/invitations', summary: 'Open (not yet accepted) invitations (owner).', responses: { 200: json(invitationListResponseSchema, 'Open invitations, newest first.'), 403: 'Not the owner.', 404: noRole } },
  { method: 'post', path: '/api/v1/designs/{id}/invitations', summary: 'Invite someone by e-mail as editor or viewer (owner with a confirmed address). Mails a single-use accept link valid 14 days; only its hash is stored.', body: createInvitationBodySchema, responses: { 201: json(invitationSchema, 'The invitation.'), 400: 'Invalid e-mail or role.', 403: 'Not the owner (forbidden), or the owner’s address is not confirmed (email_not_verified).', 404: noRole, 409: 'The person already has a role on the design.', 429: 'Too many invitations in a minute.' } },
  { method: 'delete', path: '/api/v1/designs/{id}/invitations/{invitationId}', summary: 'Withdraw an open invitation (owner).', responses: { 204: 'Withdrawn; the link no longer works.', 403: 'Not the owner.', 404: 'No such open invitation, or no role.' } },
  { method: 'get', path: '/api/v1/invitations/{token}', summary: 'What an invitation offers (design name, role, inviter), without sign-in.', auth: false, responses: { 200: json(invitationDescriptionSchema, 'The offer.'), 404: 'Unknown, withdrawn, used or expired.' } },
  { method: 'post', path: '/api/v1/invitations/{token}/accept', summary: 'Accept an invitation as the signed-in person: adds them to the design with the role.', responses: { 200: json(acceptInvitationResponseSchema, 'The design joined and the role.'), 401: 'Not signed in.', 404: 'Unknown, withdrawn, used or expired.', 409: 'The caller owns the design.' } },
  { method: 'get', path: '/api/v1/designs/{id}/summary', summary: 'A review summary (inputs, key results with units, measured values) as text/plain or text/markdown.', query: summaryQuerySchema, responses: { 200: summaryText, 400: 'format is neither text nor markdown.', 404: noRole } },
  { method: 'get', path: '/api/v1/shared/{token}/summary', summary: 'The review summary of a shared design, without sign-in.', auth: false, query: summaryQuerySchema, responses: { 200: summaryText, 400: 'Bad format.', 404: 'Unknown or revoked token.' } },
  { method: 'post', path: '/api/v1/shared/{token}/copy', summary: 'Copy a shared design into my library (new design, revision 1). Body optional: { name }.', body: copyDesignBodySchema, bodyOptional: true, responses: { 201: json(designRecordSchema, 'The new design, role owner.'), 401: 'Not signed in.', 404: 'Unknown or revoked token.' } },
  { method: 'get', path: '/api/v1/designs/{id}/export', summary: 'Download the design as a coilwright-design file (docs/design-format.md).', responses: { 200: json(designFileSchema, 'The design file, as an attachment.'), 404: noRole } },
  { method: 'post', path: '/api/v1/designs/import', summary: 'Create a design from a coilwright-design file (at most 256 kB). Nothing is created on failure.', body: designFileBodySchema, responses: { 201: json(designRecordSchema, 'The new design, role owner.'), 400: 'Not JSON, wrong format/version, or invalid fields (design issues prefixed "design.").', 401: 'Not signed in.', 413: 'Larger than 256 kB.' } },
];
