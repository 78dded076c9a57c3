import type { APIRoute } from 'astro';
import { groupIdParamSchema, renameGroupBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../server/http';
import { deleteGroup, getGroup, renameGroup } from '../../../../../server/services/groups';

export const prerender = false;

const NO_GROUP = 'No such group.';

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await getGroup(u, parseParam(params.groupId, groupIdParamSchema, NO_GROUP)));
});

export const PATCH: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, NO_GROUP);
  const b = await parseBody(request, renameGroupBodySchema);
  return Response.json(await renameGroup(u, groupId, b.name));
});

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteGroup(u, parseParam(params.groupId, groupIdParamSchema, NO_GROUP));
  return new Response(null, { status: 204 });
});
