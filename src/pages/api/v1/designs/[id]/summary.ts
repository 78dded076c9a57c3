import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { parseSummaryFormat, summaryForDesign } from '../../../../../server/services/summary';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params, url }) => {
  const u = requireUser(locals);
  const format = parseSummaryFormat(url);
  const text = await summaryForDesign(u, params.id!, format);
  return new Response(text, { headers: { 'content-type': `${format === 'markdown' ? 'text/markdown' : 'text/plain'}; charset=utf-8` } });
});
