import type { APIRoute } from 'astro';
import { startWindingBodySchema } from '../../../../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../../../../server/http';
import { listWindingSessions, startWindingSession } from '../../../../../../server/services/winding';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await listWindingSessions(requireUser(locals), params.id!)));

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await startWindingSession(u, params.id!, await parseBody(request, startWindingBodySchema)), { status: 201 });
});
