import type { APIRoute } from 'astro';
import { setDesignGroupBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../server/http';
import { getDesignGroup, setDesignGroup } from '../../../../../server/services/groups';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await getDesignGroup(u, params.id!));
});

/** The owner puts the design in one of their groups (or takes it out with null). */
export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const b = await parseBody(request, setDesignGroupBodySchema);
  return Response.json(await setDesignGroup(u, params.id!, b.groupId));
});
