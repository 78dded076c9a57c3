import type { APIRoute } from 'astro';
import { getDb } from '../../../../../../server/db';
import { handle, requireUser } from '../../../../../../server/http';
import { revokeShare } from '../../../../../../server/services/designs';

export const prerender = false;

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await revokeShare(getDb(), u, params.id!, params.token!);
  return new Response(null, { status: 204 });
});
