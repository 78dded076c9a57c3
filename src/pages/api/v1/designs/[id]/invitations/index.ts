import type { APIRoute } from 'astro';
import { createInvitationBodySchema } from '../../../../../../lib/api/contracts';
import { ApiError, handle, parseBody, requireUser } from '../../../../../../server/http';
import { allow } from '../../../../../../server/rate-limit';
import { env } from '../../../../../../server/env';
import { siteOrigin } from '../../../../../../server/site-url';
import { createInvitation, listInvitations } from '../../../../../../server/services/invitations';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ invitations: await listInvitations(u, params.id!) });
});

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  if (!allow('invite', u.id, env().COILWRIGHT_INVITE_RATE_LIMIT)) throw new ApiError('rate_limited');
  // Links in mail use the configured site address, never the request's Host header.
  const created = await createInvitation(u, params.id!, await parseBody(request, createInvitationBodySchema), siteOrigin());
  return Response.json(created, { status: 201 });
});
