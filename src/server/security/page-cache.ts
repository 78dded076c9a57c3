import { pickEncoding } from './compress';

/**
 * Pages that read nothing but the build (their text and the deterministic solver's reference checks)
 * are rendered once per process for visitors without a session and served from memory afterwards;
 * a signed-in visitor's page carries their name in the header and is rendered for them.
 */
export const SHARED_PAGES = new Set(['/', '/methods', '/safety', '/validation']);

type Stored = { body: Uint8Array; status: number; headers: [string, string][] };
const store = new Map<string, Stored>();

export function hasSessionCookie(request: Request): boolean {
  return /(?:^|;\s*)(?:__Secure-)?better-auth\.session_(?:token|data)=/.test(request.headers.get('cookie') ?? '');
}

export function sharedPageKey(request: Request, url: URL): string | null {
  if (request.method !== 'GET' || url.search !== '' || !SHARED_PAGES.has(url.pathname)) return null;
  if (hasSessionCookie(request)) return null;
  return `${url.pathname}|${pickEncoding(request.headers.get('accept-encoding')) ?? 'identity'}`;
}

export function cachedPage(key: string): Response | null {
  const s = store.get(key);
  return s ? new Response(s.body.slice(), { status: s.status, headers: s.headers }) : null;
}

/** Keeps a finished 200 response (already compressed for the key's encoding) and returns an equal one to send. */
export async function keepPage(key: string, response: Response): Promise<Response> {
  if (response.status !== 200 || response.headers.has('set-cookie')) return response;
  const body = new Uint8Array(await response.arrayBuffer());
  const headers = [...response.headers.entries()];
  store.set(key, { body, status: 200, headers });
  return new Response(body.slice(), { status: 200, headers });
}
