import type { APIRoute } from 'astro';
import { updateMeBodySchema } from '../../../lib/api/contracts';
import { handle, parseBody, requireUser } from '../../../server/http';
import { updateMe } from '../../../server/services/users';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals }) => Response.json({ user: requireUser(locals) }));

export const PATCH: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  return Response.json({ user: await updateMe(u, await parseBody(request, updateMeBodySchema)) });
});
