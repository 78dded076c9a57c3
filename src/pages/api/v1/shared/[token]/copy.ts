import type { APIRoute } from 'astro';
import { copyDesignBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../server/http';
import { copyShared } from '../../../../../server/services/revisions';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await copyShared(u, params.token!, await parseBody(request, copyDesignBodySchema, { optional: true })), { status: 201 });
});
