import type { APIRoute } from 'astro';
import { getAuth } from '../server/auth';

export const prerender = false;

// A plain form post, so signing out works without JavaScript.
export const POST: APIRoute = async ({ request, redirect }) => {
  const res = await getAuth().api.signOut({ headers: request.headers, asResponse: true });
  const out = redirect('/', 303);
  const headers = new Headers(out.headers);
  for (const c of res.headers.getSetCookie()) headers.append('set-cookie', c);
  return new Response(null, { status: 303, headers });
};
