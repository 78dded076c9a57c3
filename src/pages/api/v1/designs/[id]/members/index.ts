import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { listMembers } from '../../../../../../server/services/members';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ members: await listMembers(u, params.id!) });
});
