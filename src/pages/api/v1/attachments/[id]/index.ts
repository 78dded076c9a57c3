import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../server/http';
import { deleteAttachment, fileResponse, readAttachment } from '../../../../../server/services/attachments';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => fileResponse(await readAttachment(requireUser(locals), params.id!, 'file'), 'file'));

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await deleteAttachment(u, params.id!);
  return new Response(null, { status: 204 });
});
