import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { listAttachments, uploadAttachment } from '../../../../../../server/services/attachments';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => Response.json(await listAttachments(requireUser(locals), params.id!)));

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  return Response.json(await uploadAttachment(u, params.id!, request), { status: 201 });
});
