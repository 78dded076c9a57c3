import type { APIRoute } from 'astro';
import { updateMemberBodySchema } from '../../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../../server/http';
import { removeMember, updateMember } from '../../../../../../server/services/members';

export const prerender = false;

export const PATCH: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await updateMember(u, params.id!, params.userId!, await parseBody(request, updateMemberBodySchema)));
});

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await removeMember(u, params.id!, params.userId!);
  return new Response(null, { status: 204 });
});
