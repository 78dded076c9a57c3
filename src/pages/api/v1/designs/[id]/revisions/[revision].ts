import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../server/db';
import { ApiError, handle, requireUser } from '../../../../../../server/http';
import { getRevision } from '../../../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  const n = Number(params.revision);
  if (!Number.isInteger(n) || n < 1) throw new ApiError('not_found', 'No such revision.');
  return Response.json(await getRevision(getDb(), u, params.id!, n));
});
