import type { APIRoute } from 'astro';
import { getDb } from '../../../../server/db';
import { handle } from '../../../../server/http';
import { getShared } from '../../../../server/services/designs';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params }) => Response.json(await getShared(getDb(), params.token!)));
