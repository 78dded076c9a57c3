import { pickEncoding } from './compress';

/**
 * Pages that read nothing but the build (their text and the deterministic solver's reference checks)
 * are rendered once per process for visitors without a session and served from memory afterwards;
 * a signed-in visitor's page carries their name in the header and is rendered for them.
 */
export const SHARED_PAGES = new Set(['/', '/methods', '/safety', '/validation']);

export type StoredPage = { body: Uint8Array; status: number; headers: [string, string][] };
// Held on globalThis so the start script's front server (which loads this module from the sources) and
// the built app's middleware (its own bundled copy) share one store.
const g = globalThis as unknown as { __coilwrightPages?: Map<string, StoredPage> };
const store = (g.__coilwrightPages ??= new Map<string, StoredPage>());

const SESSION_COOKIE = /(?:^|;\s*)(?:__Secure-)?better-auth\.session_(?:token|data)=/;

export function hasSessionCookie(request: Request): boolean {
  return SESSION_COOKIE.test(request.headers.get('cookie') ?? '');
}

/** The cache key of a request, or null when its page is not one of the shared pages or it carries a session. */
export function pageKey(method: string, pathname: string, search: string, cookie: string | null | undefined, acceptEncoding: string | null | undefined): string | null {
  if (method !== 'GET' || search !== '' || !SHARED_PAGES.has(pathname)) return null;
  if (SESSION_COOKIE.test(cookie ?? '')) return null;
  return `${pathname}|${pickEncoding(acceptEncoding) ?? 'identity'}`;
}

export function sharedPageKey(request: Request, url: URL): string | null {
  return pageKey(request.method, url.pathname, url.search, request.headers.get('cookie'), request.headers.get('accept-encoding'));
}

/** The stored page for a key, as the front server writes it straight to the socket. */
export function storedPage(key: string): StoredPage | undefined {
  return store.get(key);
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
