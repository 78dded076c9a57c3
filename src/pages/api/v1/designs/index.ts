import type { APIRoute } from 'astro';
import { createDesignBodySchema } from '../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../server/http';
import { createDesign, listDesigns } from '../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals }) => {
  const u = requireUser(locals);
  return Response.json({ designs: await listDesigns(u) });
});

export const POST: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const created = await createDesign(u, await parseBody(request, createDesignBodySchema));
  return Response.json(created, { status: 201 });
});
