import { json, type RouteDoc } from './openapi-types';
import {
  acceptGroupInvitationResponseSchema,
  createGroupBodySchema,
  createGroupInvitationBodySchema,
  decideReviewBodySchema,
  designGroupResponseSchema,
  groupInvitationDescriptionSchema,
  groupInvitationListResponseSchema,
  groupInvitationSchema,
  groupListItemSchema,
  groupListResponseSchema,
  groupRecordSchema,
  renameGroupBodySchema,
  requestReviewBodySchema,
  reviewListItemSchema,
  reviewListResponseSchema,
  reviewRecordSchema,
  setDesignGroupBodySchema,
  transferGroupBodySchema,
  transferGroupResponseSchema,
  updateGroupMemberBodySchema,
  updateGroupMemberResponseSchema,
} from '../lib/api/contracts';

const G = '/api/v1/groups/{groupId}';
const R = '/api/v1/designs/{id}/reviews';

/** Groups (admin, member, supervisor) and first-light reviews. */
export const groupRoutes: RouteDoc[] = [
  { method: 'get', path: '/api/v1/groups', summary: 'My groups with my role in each.', responses: { 200: json(groupListResponseSchema, 'My groups, by name.'), 401: 'Not signed in.' } },
  { method: 'post', path: '/api/v1/groups', summary: 'Create a group; I become its admin.', body: createGroupBodySchema, responses: { 201: json(groupListItemSchema, 'The new group.'), 400: 'Invalid name.', 401: 'Not signed in.' } },
  { method: 'get', path: G, summary: 'A group with its members (members; site admins read it with role null).', responses: { 200: json(groupRecordSchema, 'The group.'), 401: 'Not signed in.', 404: 'No such group, or not in it.' } },
  { method: 'patch', path: G, summary: 'Rename a group (group admin).', body: renameGroupBodySchema, responses: { 200: json(groupListItemSchema, 'The group as stored now.'), 400: 'Invalid name.', 403: 'Not the group’s admin.', 404: 'No such group, or not in it.' } },
  { method: 'delete', path: G, summary: 'Delete a group (group admin); its designs stay with their owners, in no group.', responses: { 204: 'Deleted.', 403: 'Not the group’s admin.', 404: 'No such group, or not in it.' } },
  { method: 'get', path: `${G}/invitations`, summary: 'Open invitations to a group (group admin).', responses: { 200: json(groupInvitationListResponseSchema, 'Open invitations, newest first.'), 403: 'Not the group’s admin.', 404: 'No such group, or not in it.' } },
  { method: 'post', path: `${G}/invitations`, summary: 'Invite by e-mail as member or supervisor (group admin with a confirmed address); the link is single-use and expires after two weeks.', body: createGroupInvitationBodySchema, responses: { 201: json(groupInvitationSchema, 'Invitation sent.'), 400: 'Invalid address or role.', 403: 'Not the group’s admin, or address not confirmed (email_not_verified).', 404: 'No such group, or not in it.', 409: 'Already in the group.', 429: 'Too many invitations.' } },
  { method: 'delete', path: `${G}/invitations/{invitationId}`, summary: 'Withdraw an open invitation (group admin).', responses: { 204: 'Withdrawn.', 403: 'Not the group’s admin.', 404: 'No such open invitation.' } },
  { method: 'patch', path: `${G}/members/{userId}`, summary: 'Make a member a supervisor or back (group admin).', body: updateGroupMemberBodySchema, responses: { 200: json(updateGroupMemberResponseSchema, 'The new role.'), 400: 'Invalid role, or the admin.', 403: 'Not the group’s admin.', 404: 'Not in the group.' } },
  { method: 'delete', path: `${G}/members/{userId}`, summary: 'Remove a member (group admin), or leave the group (oneself); access to the group’s designs ends at once.', responses: { 204: 'Removed.', 400: 'The admin cannot leave; transfer first.', 403: 'Not the group’s admin.', 404: 'Not in the group.' } },
  { method: 'post', path: `${G}/transfer`, summary: 'Hand the admin role to another member (group admin); the old admin stays as a member.', body: transferGroupBodySchema, responses: { 200: json(transferGroupResponseSchema, 'Transferred.'), 400: 'Not a member of the group.', 403: 'Not the group’s admin.', 404: 'No such group, or not in it.' } },
  { method: 'get', path: '/api/v1/group-invitations/{token}', summary: 'What a group invitation is for, without sign-in.', auth: false, responses: { 200: json(groupInvitationDescriptionSchema, 'The invitation.'), 404: 'Unknown, used, withdrawn or expired.' } },
  { method: 'post', path: '/api/v1/group-invitations/{token}/accept', summary: 'Join the group with the invited role (single-use).', responses: { 200: json(acceptGroupInvitationResponseSchema, 'Joined.'), 401: 'Not signed in.', 404: 'Unknown, used, withdrawn or expired.', 409: 'Already the group’s admin.' } },
  { method: 'get', path: '/api/v1/designs/{id}/group', summary: 'The design’s group and who reaches the design through it.', responses: { 200: json(designGroupResponseSchema, 'The group, or nulls.'), 404: 'No role on it.' } },
  { method: 'put', path: '/api/v1/designs/{id}/group', summary: 'Put the design in one of my groups, or out with null (owner).', body: setDesignGroupBodySchema, responses: { 200: json(designGroupResponseSchema, 'The design’s group now.'), 400: 'Not one of my groups.', 403: 'Not the owner.', 404: 'No role on it.' } },
  { method: 'get', path: R, summary: 'First-light reviews of a design, newest first; same access as the design.', responses: { 200: json(reviewListResponseSchema, 'The reviews; current is false once the design changed since.'), 404: 'No role on it.' } },
  { method: 'post', path: R, summary: 'Ask for a first-light review of one revision, from a named reviewer or the group’s supervisors (owner or editor).', body: requestReviewBodySchema, responses: { 201: json(reviewListItemSchema, 'Requested; the reviewers are mailed.'), 400: 'No such revision, or no one to review.', 403: 'Cannot edit the design.', 404: 'No role on it.', 409: 'A review is waiting already.' } },
  { method: 'get', path: `${R}/{reviewId}`, summary: 'One review with its checklist (generated from the reviewed revision) and findings.', responses: { 200: json(reviewRecordSchema, 'The review.'), 404: 'No such review, or no role on the design.' } },
  { method: 'post', path: `${R}/{reviewId}/decision`, summary: 'Record findings and sign off or ask for changes (the named reviewer or a group supervisor; never the requester).', body: decideReviewBodySchema, responses: { 200: json(reviewRecordSchema, 'Decided; the requester is mailed.'), 400: 'Checklist incomplete or findings invalid.', 403: 'Not a reviewer of this request, or one’s own request.', 404: 'No such review, or no role.', 409: 'Decided already.' } },
];
