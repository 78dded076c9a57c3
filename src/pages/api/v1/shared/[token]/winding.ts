import type { APIRoute } from 'astro';
import { handle } from '../../../../../server/http';
import { listSharedWindingSessions } from '../../../../../server/services/winding';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params }) => Response.json(await listSharedWindingSessions(params.token!)));
