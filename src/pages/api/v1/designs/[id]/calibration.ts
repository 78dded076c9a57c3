import type { APIRoute } from 'astro';
import { calibrationBodySchema } from '../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../server/http';
import { getCalibration, putCalibration } from '../../../../../server/services/measurements';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await getCalibration(requireUser(locals), params.id!)));

export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await putCalibration(u, params.id!, await parseBody(request, calibrationBodySchema)));
});
