import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { fileResponse, readAttachment } from '../../../../../server/services/attachments';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => fileResponse(await readAttachment(requireUser(locals), params.id!, 'thumbnail'), 'thumbnail'));
