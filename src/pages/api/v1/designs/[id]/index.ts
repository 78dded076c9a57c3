import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, readJson, requireUser } from '../../../../../server/http';
import { deleteDesign, getDesign, updateDesign } from '../../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await getDesign(getDb(), u, params.id!));
});

export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await updateDesign(getDb(), u, params.id!, await readJson(request)));
});

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteDesign(getDb(), u, params.id!);
  return new Response(null, { status: 204 });
});
