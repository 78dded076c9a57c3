import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { listRevisions } from '../../../../../../server/services/revisions';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ revisions: await listRevisions(u, params.id!) });
});
