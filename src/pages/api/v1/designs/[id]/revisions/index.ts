import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../server/db';
import { handle, requireUser } from '../../../../../../server/http';
import { listRevisions } from '../../../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ revisions: await listRevisions(getDb(), u, params.id!) });
});
