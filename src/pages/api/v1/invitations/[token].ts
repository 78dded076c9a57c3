import type { APIRoute } from 'astro';
import { handle } from '../../../../server/http';
import { describeInvitation } from '../../../../server/services/invitations';

export const prerender = false;

export const GET: APIRoute = handle(async ({ params }) => Response.json(await describeInvitation(params.token!)));
