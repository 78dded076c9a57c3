import type { APIRoute } from 'astro';
import { compareQuerySchema } from '../../../../../lib/api/contracts';
import { handle, parseQuery, requireUser } from '../../../../../server/http';
import { compareRevisions } from '../../../../../server/services/revisions';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params, url }) => {
  const u = requireUser(locals);
  const { from, to } = parseQuery(url, compareQuerySchema, 'Give two revision numbers to compare.');
  return Response.json(await compareRevisions(u, params.id!, from, to));
});
