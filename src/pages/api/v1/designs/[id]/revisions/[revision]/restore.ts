import type { APIRoute } from 'astro';
import { restoreRevisionBodySchema, revisionNumberParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../../server/http';
import { restoreRevision } from '../../../../../../../server/services/revisions';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const n = parseParam(params.revision, revisionNumberParamSchema, 'No such revision.');
  return Response.json(await restoreRevision(u, params.id!, n, await parseBody(request, restoreRevisionBodySchema, { optional: true })), { status: 201 });
});
