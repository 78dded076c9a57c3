import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { acceptGroupInvitation } from '../../../../../server/services/groups';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await acceptGroupInvitation(u, params.token ?? ''));
});
