import type { APIRoute } from 'astro';
import { z } from 'zod';
import { groupIdParamSchema, updateGroupMemberBodySchema } from '../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../server/http';
import { removeGroupMember, setGroupMemberRole } from '../../../../../../server/services/groups';

export const prerender = false;

const userIdParam = z.string().min(1).max(128);

export const PATCH: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, 'No such group.');
  const userId = parseParam(params.userId, userIdParam, 'This person is not in the group.');
  const b = await parseBody(request, updateGroupMemberBodySchema);
  return Response.json(await setGroupMemberRole(u, groupId, userId, b.role));
});

/** The admin removes a member; a member removes themselves to leave. */
export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, 'No such group.');
  await removeGroupMember(u, groupId, parseParam(params.userId, userIdParam, 'This person is not in the group.'));
  return new Response(null, { status: 204 });
});
