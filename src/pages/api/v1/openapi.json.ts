import type { APIRoute } from 'astro';
import { handle } from '../../../server/http';
import { openApiDocument } from '../../../server/openapi';

export const prerender = false;

export const GET: APIRoute = handle(() => Response.json(openApiDocument()));
