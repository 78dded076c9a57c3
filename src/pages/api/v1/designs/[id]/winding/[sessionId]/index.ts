import type { APIRoute } from 'astro';
import { windingIdParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseParam, requireUser } from '../../../../../../../server/http';
import { getWindingSession } from '../../../../../../../server/services/winding';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) =>
  Response.json(await getWindingSession(requireUser(locals), params.id!, parseParam(params.sessionId, windingIdParamSchema, 'No such winding session.'))),
);
