import type { APIRoute } from 'astro';
import { groupIdParamSchema, transferGroupBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../server/http';
import { transferGroupAdmin } from '../../../../../server/services/groups';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, 'No such group.');
  const b = await parseBody(request, transferGroupBodySchema);
  return Response.json(await transferGroupAdmin(u, groupId, b.userId));
});
