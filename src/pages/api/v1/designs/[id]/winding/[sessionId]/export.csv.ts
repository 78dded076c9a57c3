import type { APIRoute } from 'astro';
import { windingIdParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseParam, requireUser } from '../../../../../../../server/http';
import { getWindingSession } from '../../../../../../../server/services/winding';
import { sessionCsv } from '../../../../../../../lib/winding';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const s = await getWindingSession(requireUser(locals), params.id!, parseParam(params.sessionId, windingIdParamSchema, 'No such winding session.'));
  const file = `${s.designName.replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'design'}-winding-${s.startedAt.slice(0, 10)}.csv`;
  return new Response(sessionCsv(s), {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${file}"`, 'cache-control': 'private, no-store' },
  });
});
