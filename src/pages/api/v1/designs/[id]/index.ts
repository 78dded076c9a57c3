import type { APIRoute } from 'astro';
import { updateDesignBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../server/http';
import { deleteDesign, getDesignJson, updateDesign } from '../../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return new Response(await getDesignJson(u, params.id!), { headers: { 'content-type': 'application/json' } });
});

export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await updateDesign(u, params.id!, await parseBody(request, updateDesignBodySchema)));
});

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteDesign(u, params.id!);
  return new Response(null, { status: 204 });
});
