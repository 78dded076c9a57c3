import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../server/db';
import { handle, readJson, requireUser } from '../../../../../../server/http';
import { removeMember, updateMember } from '../../../../../../server/services/members';

export const prerender = false;

export const PATCH: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await updateMember(getDb(), u, params.id!, params.userId!, await readJson(request)));
});

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await removeMember(getDb(), u, params.id!, params.userId!);
  return new Response(null, { status: 204 });
});
