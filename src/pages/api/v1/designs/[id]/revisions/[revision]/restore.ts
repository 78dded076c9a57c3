import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../../server/db';
import { ApiError, handle, requireUser } from '../../../../../../../server/http';
import { readOptionalJson } from '../../../../../../../server/optional-json';
import { restoreRevision } from '../../../../../../../server/services/revisions';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const n = Number(params.revision);
  if (!Number.isInteger(n) || n < 1) throw new ApiError('not_found', 'No such revision.');
  return Response.json(await restoreRevision(getDb(), u, params.id!, n, await readOptionalJson(request)), { status: 201 });
});
