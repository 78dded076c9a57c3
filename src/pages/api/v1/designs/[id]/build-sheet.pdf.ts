import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { getBuildSheet, parseBuildSheetQuery } from '../../../../../server/services/build-sheet';
import { renderBuildSheetPdf } from '../../../../../server/pdf/build-sheet';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params, url }) => {
  const query = parseBuildSheetQuery(url);
  const s = await getBuildSheet(requireUser(locals), params.id!, query);
  const pdf = await renderBuildSheetPdf({ designName: s.name, revision: s.revision, generatedAt: new Date(), sections: s.sections, options: query });
  const file = `${s.name.replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'design'}-build-sheet.pdf`;
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `inline; filename="${file}"`,
      'cache-control': 'private, no-store',
    },
  });
});
