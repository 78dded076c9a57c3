import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, readJson, requireUser } from '../../../../../server/http';
import { getCalibration, putCalibration } from '../../../../../server/services/measurements';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await getCalibration(getDb(), locals.user, params.id!)));

export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await putCalibration(getDb(), u, params.id!, await readJson(request)));
});
