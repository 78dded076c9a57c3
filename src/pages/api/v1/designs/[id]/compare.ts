import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, requireUser } from '../../../../../server/http';
import { compareRevisions, parseRevisionNumber } from '../../../../../server/services/revisions';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params, url }) => {
  const u = requireUser(locals);
  const from = parseRevisionNumber(url.searchParams.get('from'), 'from');
  const to = parseRevisionNumber(url.searchParams.get('to'), 'to');
  return Response.json(await compareRevisions(getDb(), u, params.id!, from, to));
});
