import type { APIRoute } from 'astro';
import { handle, requireUser } from '../../../../../../server/http';
import { revokeInvitation } from '../../../../../../server/services/invitations';

export const prerender = false;

export const DELETE: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  await revokeInvitation(u, params.id!, params.invitationId!);
  return new Response(null, { status: 204 });
});
