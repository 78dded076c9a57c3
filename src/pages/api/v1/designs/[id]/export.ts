import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { exportDesign } from '../../../../../server/services/import-export';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  const { file, fileName } = await exportDesign(u, params.id!);
  return new Response(JSON.stringify(file, null, 2) + '\n', {
    headers: {
      'content-type': 'application/json; charset=utf-8',
      'content-disposition': `attachment; filename="${fileName}"`,
    },
  });
});
