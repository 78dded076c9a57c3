/**
 * Requests the front server answers itself, before they reach the Astro handler: the signed-in read of one
 * design, GET /api/v1/designs/:id, the most frequent request of an open designer; a repeat visit to the design
 * page, GET /designs/:id, whose HTML the app has already rendered for the same inputs; and POST /api/v1/solve,
 * whose answer is all computation (see fastSolve). For the reads it runs the same steps as the app would,
 * with the same code: the session from the memo of verified session cookies (only an entry the app itself
 * remembered, for a user with no recent change), the same access check, the same stored JSON text
 * (services/designs) and the same render-cache key (design-page.ts). Anything else (no remembered session, no
 * such design, no role, a query string, an error) is left to the app, which answers it in full, so that the
 * app stays the only author of every error, cookie refresh and redirect.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { siteOrigins } from '../../src/server/auth';
import { errorResponse, ApiError, MAX_JSON, payloadTooLarge } from '../../src/server/http';
import { take } from '../../src/server/rate-limit';
import { rateLimitHeaders } from '../../src/server/security/limiter';
import { checkSameOrigin } from '../../src/server/security/origin';
import { solveInput } from '../../src/server/services/solve';
import { recallSession, sessionCookieKey } from '../../src/server/auth/session-memo';
import { changedWithin } from '../../src/server/auth/freshness';
import { env } from '../../src/server/env';
import { getDesignJson } from '../../src/server/services/designs';
import { designPageKey, openDesignPage } from '../../src/server/design-page';
import { encodedRender, storedRender } from '../../src/server/render-cache';
import type { SessionUser } from '../../src/server/session';
import { appendVary, encodeBody, MIN_COMPRESS_BYTES, pickEncoding } from '../../src/server/security/compress';
import { NON_HTML_CSP } from '../../src/server/security/headers';

// Designs are named by UUIDs (services/designs); other paths under these (/designs/new) go to the app unread.
const UUID = '[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}';
const DESIGN_READ = new RegExp(`^/api/v1/designs/(${UUID})$`);
const DESIGN_PAGE = new RegExp(`^/designs/(${UUID})$`);

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

function send(res: ServerResponse, type: string, csp: string, encoding: string | null, body: Uint8Array, extra: Record<string, string> = {}) {
  const headers = new Headers({ 'content-type': type, 'content-security-policy': csp, ...extra });
  appendVary(headers, 'Accept-Encoding');
  if (encoding) headers.set('content-encoding', encoding);
  headers.set('content-length', String(body.byteLength));
  for (const [k, v] of headers) res.setHeader(k, v);
  res.statusCode = 200;
  res.end(body);
}

let origins: ReadonlySet<string> | undefined;

/**
 * POST /api/v1/solve with the route's own steps (pages/api/v1/solve.ts, server/http.ts): the same-origin
 * check, the solve rate limit with its RateLimit headers, the 1 MB body limit, JSON, the design's fields and
 * the solve, each failure the contract's error. A request the front server cannot finish on the same terms
 * is left to the app before its body is read: a refused origin, a session cookie (whose refreshed copy the
 * app sends), a declared length over the limit.
 */
export async function fastSolve(req: IncomingMessage, res: ServerResponse): Promise<boolean> {
  const headers = new Headers();
  for (const [k, v] of Object.entries(req.headers)) if (typeof v === 'string') headers.set(k, v);
  origins ??= siteOrigins();
  if (!checkSameOrigin('POST', headers, origins).ok) return false;
  if (sessionCookieKey(headers.get('cookie')) !== '') return false;
  if (Number(headers.get('content-length') ?? '0') > MAX_JSON) return false;

  const decision = take('solve', String(req.headers['x-forwarded-for'] ?? ''), env().COILWRIGHT_SOLVE_RATE_LIMIT);
  const limitHeaders = rateLimitHeaders(decision, 'solve');
  if (!decision.allowed) {
    await sendError(res, new ApiError('rate_limited'), limitHeaders);
    return true;
  }
  // Read to the end (the connection stays usable), keeping nothing past the limit.
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req as AsyncIterable<Buffer>) {
    size += chunk.byteLength;
    if (size <= MAX_JSON) chunks.push(chunk);
  }
  if (size > MAX_JSON) {
    await sendError(res, payloadTooLarge(), limitHeaders);
    return true;
  }
  try {
    let input: unknown;
    try {
      input = JSON.parse(Buffer.concat(chunks).toString('utf8'));
    } catch {
      throw new ApiError('invalid_json');
    }
    const body: Uint8Array = Buffer.from(JSON.stringify(solveInput(input).result));
    const encoding = body.byteLength >= MIN_COMPRESS_BYTES ? pickEncoding(req.headers['accept-encoding'] as string | undefined) : null;
    send(res, 'application/json', NON_HTML_CSP, encoding, encoding ? await encodeBody(body, encoding) : body, limitHeaders);
  } catch (e) {
    if (!(e instanceof ApiError)) console.error('[api]', e);
    await sendError(res, e instanceof ApiError ? e : new ApiError('internal_error'), limitHeaders);
  }
  return true;
}

export async function sendError(res: ServerResponse, e: ApiError, extra: Record<string, string>) {
  const r = errorResponse(e.code, e.message, e.issues, e.extra);
  const body: Uint8Array = new Uint8Array(await r.arrayBuffer());
  res.statusCode = r.status;
  for (const [k, v] of r.headers) res.setHeader(k, v);
  for (const [k, v] of Object.entries(extra)) res.setHeader(k, v);
  res.setHeader('content-security-policy', NON_HTML_CSP);
  res.setHeader('content-length', String(body.byteLength));
  res.end(body);
}
