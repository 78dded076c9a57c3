import type { APIRoute } from 'astro';
import { handle } from '../../../../server/http';
import { getShared } from '../../../../server/services/shares';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params }) => Response.json(await getShared(params.token!)));
