import type { APIRoute } from 'astro';
import { groupIdParamSchema } from '../../../../../../lib/api/contracts';
import { handle, parseParam, requireUser } from '../../../../../../server/http';
import { withdrawGroupInvitation } from '../../../../../../server/services/groups';

export const prerender = false;

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  const groupId = parseParam(params.groupId, groupIdParamSchema, 'No such group.');
  await withdrawGroupInvitation(u, groupId, parseParam(params.invitationId, groupIdParamSchema, 'No such open invitation.'));
  return new Response(null, { status: 204 });
});
