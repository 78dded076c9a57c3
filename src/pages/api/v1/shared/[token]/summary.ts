import type { APIRoute } from 'astro';
import { handle } from '../../../../../server/http';
import { siteOrigin } from '../../../../../server/site-url';
import { parseSummaryFormat, summaryForShared } from '../../../../../server/services/summary';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params, url }) => {
  const format = parseSummaryFormat(url);
  const text = await summaryForShared(params.token!, format, siteOrigin());
  return new Response(text, { headers: { 'content-type': `${format === 'markdown' ? 'text/markdown' : 'text/plain'}; charset=utf-8` } });
});
