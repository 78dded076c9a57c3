import type { APIRoute } from 'astro';
import { getAuth, CLIENT_IP_HEADER } from '../../../server/auth';

export const prerender = false;

// The Node adapter sets no client-IP header: pass the socket's address (overwriting any sent by the client).
export const ALL: APIRoute = async (ctx) => {
  const headers = new Headers(ctx.request.headers);
  headers.set(CLIENT_IP_HEADER, ctx.clientAddress);
  const request = new Request(ctx.request, { headers });
  return getAuth().handler(request);
};
