import { defineMiddleware } from 'astro:middleware';
import { getAuth, sessionCacheMs, siteOrigins } from './server/auth';
import { changedWithin } from './server/auth/freshness';
import { recallSession, rememberSession, sessionCookieKey } from './server/auth/session-memo';
import { dbReady } from './server/db';
import { errorResponse } from './server/http';
import { toSessionUser } from './server/session';
import { checkSameOrigin } from './server/security/origin';
import { finishResponse } from './server/security/respond';
import { cachedPage, hasSessionCookie, keepPage, sharedPageKey } from './server/security/page-cache';
import { HTTPS_HEADER } from './server/security/forwarded';
import { keepRender } from './server/render-cache';

let origins: ReadonlySet<string> | undefined;

type Lookup = { user: App.Locals['user']; session: App.Locals['session']; setCookies: string[] };
const lookups = new Map<string, Promise<Lookup>>();

/** The session of a request's cookies through better-auth (its signed cookie cache, or the database). */
async function lookUpSession(requestHeaders: Headers, memoKey: string): Promise<Lookup> {
  const none: Lookup = { user: null, session: null, setCookies: [] };
  try {
    const auth = getAuth();
    let { headers, response: found } = await auth.api.getSession({ headers: requestHeaders, returnHeaders: true });
    if (found && changedWithin(found.user.id, sessionCacheMs())) {
      // The cached copy may predate the change: ask the database (this also rewrites the cookie).
      ({ headers, response: found } = await auth.api.getSession({ headers: requestHeaders, returnHeaders: true, query: { disableCookieCache: true } }));
    }
    const setCookies = headers.getSetCookie();
    if (!found || (found.user as { banned?: boolean }).banned) return { ...none, setCookies };
    const user = toSessionUser(found.user as Record<string, unknown>);
    const session = { id: found.session.id, expiresAt: new Date(found.session.expiresAt) };
    // Only a lookup that left the cookies as they were is remembered: a refreshed cookie goes out once.
    if (setCookies.length === 0) rememberSession(memoKey, { user, session });
    return { user, session, setCookies };
  } catch (e) {
    console.error('[session]', e);
    return none;
  }
}

// Fills Astro.locals (each page and endpoint guards itself), refuses cross-site writes, and finishes
// every response: security headers, rate-limit headers, refreshed session cookies, compression.
export const onRequest = defineMiddleware(async (context, next) => {
  context.locals.user = null;
  context.locals.session = null;
  if (context.isPrerendered) return next();
  const { request, url } = context;
  const https = url.protocol === 'https:' || request.headers.get(HTTPS_HEADER) === '1';

  // better-auth checks the origin of its own routes.
  if (!url.pathname.startsWith('/api/auth/')) {
    origins ??= siteOrigins();
    const verdict = checkSameOrigin(request.method, request.headers, origins);
    if (!verdict.ok) {
      const refused = url.pathname.startsWith('/api/')
        ? errorResponse('forbidden', 'Requests that change data must come from this site’s own pages.')
        : new Response('Requests that change data must come from this site’s own pages.', { status: 403, headers: { 'content-type': 'text/plain; charset=utf-8' } });
      return finishResponse(request, refused, { https, csp: !import.meta.env.DEV });
    }
  }

  const cacheKey = sharedPageKey(request, url);
  if (cacheKey) {
    const hit = cachedPage(cacheKey);
    if (hit) return hit;
  }

  await dbReady();
  let setCookies: string[] = [];
  // Without a session cookie there is no session to find: skip better-auth's lookup altogether.
  const memoKey = hasSessionCookie(request) ? sessionCookieKey(request.headers.get('cookie')) : '';
  const recalled = memoKey ? recallSession(memoKey) : null;
  if (recalled && !changedWithin(recalled.user.id, sessionCacheMs())) {
    context.locals.user = recalled.user;
    context.locals.session = recalled.session;
  } else if (memoKey) {
    // One lookup per cookie at a time: when a remembered session expires under load, the requests that
    // carry the same cookie wait for the one lookup instead of each asking the database.
    let lookup = lookups.get(memoKey);
    if (!lookup) {
      lookup = lookUpSession(request.headers, memoKey).finally(() => lookups.delete(memoKey));
      lookups.set(memoKey, lookup);
    }
    const found = await lookup;
    setCookies = found.setCookies;
    context.locals.user = found.user;
    context.locals.session = found.session;
  }
  let response = await next();
  if (context.locals.renderKey) response = await keepRender(context.locals.renderKey, response);
  // A path under /api/ that matches no endpoint gets the contract's JSON error, not the HTML 404 page.
  if (response.status === 404 && url.pathname.startsWith('/api/') && (response.headers.get('content-type') ?? '').startsWith('text/html')) {
    response = errorResponse('not_found', 'There is no such API endpoint.');
  }
  // A route that set the session cookie itself (sign-in, sign-out) has the last word on it.
  const own = response.headers.getSetCookie().some((c) => /better-auth\.session_/.test(c));
  const finished = await finishResponse(request, response, {
    https,
    csp: !import.meta.env.DEV,
    extraHeaders: context.locals.rateLimit,
    setCookies: own ? [] : setCookies,
  });
  return cacheKey && !context.locals.user ? keepPage(cacheKey, finished) : finished;
});
