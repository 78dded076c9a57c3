import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../server/db';
import { handle, readJson, requireUser } from '../../../../../../server/http';
import { createMeasurement, listMeasurements } from '../../../../../../server/services/measurements';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await listMeasurements(getDb(), locals.user, params.id!)));

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await createMeasurement(getDb(), u, params.id!, await readJson(request)), { status: 201 });
});
