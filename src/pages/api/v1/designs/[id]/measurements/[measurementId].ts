import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { deleteMeasurement } from '../../../../../../server/services/measurements';

export const prerender = false;

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteMeasurement(u, params.id!, params.measurementId!);
  return new Response(null, { status: 204 });
});
