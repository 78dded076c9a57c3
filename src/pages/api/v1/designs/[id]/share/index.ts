import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { createShare, listShares } from '../../../../../../server/services/shares';
import { siteOrigin } from '../../../../../../server/site-url';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ shares: await listShares(u, params.id!, siteOrigin()) });
});

export const POST: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await createShare(u, params.id!, siteOrigin()), { status: 201 });
});
