import type { APIRoute } from 'astro';
import { createGroupBodySchema } from '../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../server/http';
import { createGroup, listGroups } from '../../../../server/services/groups';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals }) => {
  const u = requireUser(locals);
  return Response.json({ groups: await listGroups(u) });
});

export const POST: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const b = await parseBody(request, createGroupBodySchema);
  return Response.json(await createGroup(u, b.name), { status: 201 });
});
