import type { APIRoute } from 'astro';
import { createGroupInvitationBodySchema, groupIdParamSchema } from '../../../../../../lib/api/contracts';
import { ApiError, handle, parseBody, parseParam, requireUser } from '../../../../../../server/http';
import { allow } from '../../../../../../server/rate-limit';
import { siteOrigin } from '../../../../../../server/site-url';
import { inviteToGroup, listGroupInvitations } from '../../../../../../server/services/groups';

export const prerender = false;

// Each invitation sends a mail; a short burst is fine, a flood is not.
const PER_MINUTE = 20;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ invitations: await listGroupInvitations(u, parseParam(params.groupId, groupIdParamSchema, 'No such group.')) });
});

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, 'No such group.');
  if (!allow('invite', u.id, PER_MINUTE)) throw new ApiError('rate_limited');
  const b = await parseBody(request, createGroupInvitationBodySchema);
  // Links in mail use the configured site address, never the request's Host header.
  return Response.json(await inviteToGroup(u, groupId, b, siteOrigin()), { status: 201 });
});
