import type { APIRoute } from 'astro';
import { transferBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../server/http';
import { transferOwnership } from '../../../../../server/services/members';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await transferOwnership(u, params.id!, await parseBody(request, transferBodySchema)));
});
