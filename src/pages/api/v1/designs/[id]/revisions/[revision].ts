import type { APIRoute } from 'astro';
import { revisionNumberParamSchema } from '../../../../../../lib/api/contracts';
import { handle, parseParam, requireUser } from '../../../../../../server/http';
import { getRevision } from '../../../../../../server/services/revisions';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  const n = parseParam(params.revision, revisionNumberParamSchema, 'No such revision.');
  return Response.json(await getRevision(u, params.id!, n));
});
