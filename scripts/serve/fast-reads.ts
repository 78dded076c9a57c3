/**
 * Reads the front server answers itself, before the request reaches the Astro handler: the signed-in read of
 * one design, GET /api/v1/designs/:id, the most frequent request of an open designer, and a repeat visit to
 * the design page, GET /designs/:id, whose HTML the app has already rendered for the same inputs. It runs the
 * same steps as the app would, with the same code: the session from the memo of verified session cookies
 * (only an entry the app itself remembered, for a user with no recent change), the same access check, the
 * same stored JSON text (services/designs) and the same render-cache key (design-page.ts). Anything else (no remembered session, no such design, no
 * role, a query string, an error) is left to the app, which answers it in full, so that the app stays the
 * only author of every error, cookie refresh and redirect.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { recallSession, sessionCookieKey } from '../../src/server/auth/session-memo';
import { changedWithin } from '../../src/server/auth/freshness';
import { env } from '../../src/server/env';
import { getDesignJson } from '../../src/server/services/designs';
import { designPageKey, openDesignPage } from '../../src/server/design-page';
import { encodedRender, storedRender } from '../../src/server/render-cache';
import type { SessionUser } from '../../src/server/session';
import { appendVary, encodeBody, MIN_COMPRESS_BYTES, pickEncoding } from '../../src/server/security/compress';
import { NON_HTML_CSP } from '../../src/server/security/headers';

const DESIGN_READ = /^\/api\/v1\/designs\/([A-Za-z0-9_-]{1,64})$/;
const DESIGN_PAGE = /^\/designs\/([A-Za-z0-9_-]{1,64})$/;

/**
 * Answers the request when it is one of the fast reads and everything it needs is at hand; resolves to
 * false, having written nothing, when the app must answer it. Security headers common to every response
 * are already on `res` (the front server sets them first).
 */
export async function fastRead(req: IncomingMessage, res: ServerResponse): Promise<boolean> {
  if (req.method !== 'GET' || !req.url) return false;
  const read = DESIGN_READ.exec(req.url);
  const page = read ? null : DESIGN_PAGE.exec(req.url);
  if (!read && !page) return false;
  const user = rememberedUser(req);
  if (!user) return false;
  try {
    return read ? await sendDesignJson(req, res, user, read[1]) : await sendDesignPage(req, res, user, page![1], req.url);
  } catch {
    return false;
  }
}

/** The viewer of a request whose session the app verified and remembered, with no change since; else null. */
function rememberedUser(req: IncomingMessage): SessionUser | null {
  const key = sessionCookieKey(req.headers.cookie ?? null);
  const recalled = key ? recallSession(key) : null;
  if (!recalled || changedWithin(recalled.user.id, env().COILWRIGHT_SESSION_CACHE_SECONDS * 1000)) return null;
  return recalled.user;
}

async function sendDesignJson(req: IncomingMessage, res: ServerResponse, user: SessionUser, id: string): Promise<boolean> {
  const text = await getDesignJson(user, id);
  const body: Uint8Array = Buffer.from(text);
  const encoding = body.byteLength >= MIN_COMPRESS_BYTES ? pickEncoding(req.headers['accept-encoding'] as string | undefined) : null;
  send(res, 'application/json', NON_HTML_CSP, encoding, encoding ? await encodeBody(body, encoding) : body);
  return true;
}

async function sendDesignPage(req: IncomingMessage, res: ServerResponse, user: SessionUser, id: string, address: string): Promise<boolean> {
  const page = await openDesignPage(user, id);
  if (!page) return false;
  const stored = storedRender(await designPageKey(page, address));
  if (!stored) return false;
  const encoding = stored.body.byteLength >= MIN_COMPRESS_BYTES ? pickEncoding(req.headers['accept-encoding'] as string | undefined) : null;
  send(res, stored.type, stored.csp, encoding, encoding ? await encodedRender(stored, encoding) : stored.body);
  return true;
}

function send(res: ServerResponse, type: string, csp: string, encoding: string | null, body: Uint8Array) {
  const headers = new Headers({ 'content-type': type, 'content-security-policy': csp });
  appendVary(headers, 'Accept-Encoding');
  if (encoding) headers.set('content-encoding', encoding);
  headers.set('content-length', String(body.byteLength));
  for (const [k, v] of headers) res.setHeader(k, v);
  res.statusCode = 200;
  res.end(body);
}
