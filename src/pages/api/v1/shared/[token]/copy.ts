import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, requireUser } from '../../../../../server/http';
import { readOptionalJson } from '../../../../../server/optional-json';
import { copyShared } from '../../../../../server/services/revisions';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await copyShared(getDb(), u, params.token!, await readOptionalJson(request)), { status: 201 });
});
