import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { parseTroubleshootQuery, troubleshootDesign } from '../../../../../server/services/troubleshoot';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params, url }) => Response.json(await troubleshootDesign(requireUser(locals), params.id!, parseTroubleshootQuery(url))));
