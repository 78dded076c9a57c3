import type { APIRoute } from 'astro';
import { handle } from '../../../../../server/http';
import { fileResponse, readAttachment } from '../../../../../server/services/attachments';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => fileResponse(await readAttachment(locals.user, params.id!, 'thumbnail'), 'thumbnail'));
