import type { APIRoute } from 'astro';
import { measurementBodySchema } from '../../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../../server/http';
import { createMeasurement, listMeasurements } from '../../../../../../server/services/measurements';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await listMeasurements(requireUser(locals), params.id!)));

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await createMeasurement(u, params.id!, await parseBody(request, measurementBodySchema)), { status: 201 });
});
