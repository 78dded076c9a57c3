import type { APIRoute } from 'astro';
import { getDb } from '../../../../../server/db';
import { handle, requireUser } from '../../../../../server/http';
import { deleteAttachment, fileResponse, readAttachment } from '../../../../../server/services/attachments';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => fileResponse(await readAttachment(getDb(), locals.user, params.id!, 'file'), 'file'));

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteAttachment(getDb(), u, params.id!);
  return new Response(null, { status: 204 });
});
