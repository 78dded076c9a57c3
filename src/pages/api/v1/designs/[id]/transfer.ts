import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, readJson, requireUser } from '../../../../../server/http';
import { transferOwnership } from '../../../../../server/services/members';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await transferOwnership(getDb(), u, params.id!, await readJson(request)));
});
