import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { acceptInvitation } from '../../../../../server/services/invitations';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await acceptInvitation(u, params.token!));
});
