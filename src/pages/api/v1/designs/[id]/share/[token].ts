import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { revokeShare } from '../../../../../../server/services/shares';

export const prerender = false;

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await revokeShare(u, params.id!, params.token!);
  return new Response(null, { status: 204 });
});
