import type { APIRoute } from 'astro';
import { windingChecklistBodySchema, windingIdParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../../server/http';
import { putWindingChecklist } from '../../../../../../../server/services/winding';

export const prerender = false;

export const PUT: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const sessionId = parseParam(params.sessionId, windingIdParamSchema, 'No such winding session.');
  return Response.json(await putWindingChecklist(u, params.id!, sessionId, await parseBody(request, windingChecklistBodySchema)));
});
