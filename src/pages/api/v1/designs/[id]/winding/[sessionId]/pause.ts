import type { APIRoute } from 'astro';
import { windingIdParamSchema, windingPauseBodySchema } from '../../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../../server/http';
import { pauseWindingSession } from '../../../../../../../server/services/winding';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const sessionId = parseParam(params.sessionId, windingIdParamSchema, 'No such winding session.');
  return Response.json(await pauseWindingSession(u, params.id!, sessionId, await parseBody(request, windingPauseBodySchema)));
});
