import type { APIRoute } from 'astro';
import { windingIdParamSchema, windingReadingBodySchema } from '../../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../../server/http';
import { addWindingReading } from '../../../../../../../server/services/winding';

export const prerender = false;

/** 201 when the reading is new, 200 when it was already stored (sent again from an offline queue). */
export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const sessionId = parseParam(params.sessionId, windingIdParamSchema, 'No such winding session.');
  const { status, body } = await addWindingReading(u, params.id!, sessionId, await parseBody(request, windingReadingBodySchema));
  return Response.json(body, { status });
});
