import type { APIRoute } from 'astro';
import { handle } from '../../../../server/http';
import { describeGroupInvitation } from '../../../../server/services/groups';

export const prerender = false;

/** What the invitation is for, without sign-in: the token itself is the proof. */
export const GET: APIRoute = handle(async ({ params }) => Response.json(await describeGroupInvitation(params.token ?? '')));
