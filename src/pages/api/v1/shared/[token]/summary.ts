import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle } from '../../../../../server/http';
import { siteOrigin } from '../../../../../server/site-url';
import { parseSummaryFormat, summaryForShared } from '../../../../../server/services/summary';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params, url }) => {
  const format = parseSummaryFormat(url);
  const text = await summaryForShared(getDb(), params.token!, format, siteOrigin());
  return new Response(text, { headers: { 'content-type': `${format === 'markdown' ? 'text/markdown' : 'text/plain'}; charset=utf-8` } });
});
