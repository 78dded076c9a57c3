import type { APIRoute } from 'astro';
import { getDb } from '../../../../server/db';
import { handle, readJson, requireUser } from '../../../../server/http';
import { createDesign, listDesigns } from '../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals }) => {
  const u = requireUser(locals);
  return Response.json({ designs: await listDesigns(getDb(), u) });
});

export const POST: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const created = await createDesign(getDb(), u, await readJson(request));
  return Response.json(created, { status: 201 });
});
