/**
 * Refusal of cross-site state-changing requests (OWASP Cross-Site Request Forgery Prevention Cheat
 * Sheet: "Verifying origin with standard headers" and Fetch Metadata). Browsers send `Sec-Fetch-Site`
 * and `Origin` on every cross-origin POST/PUT/PATCH/DELETE; a request that carries neither comes
 * from a program (curl, a script, a server) and holds no browser's cookies, so it passes.
 */
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export type OriginVerdict = { ok: true } | { ok: false; reason: string };

export function checkSameOrigin(method: string, headers: Headers, allowedOrigins: ReadonlySet<string>): OriginVerdict {
  if (SAFE.has(method.toUpperCase())) return { ok: true };
  const site = headers.get('sec-fetch-site');
  if (site && site !== 'same-origin' && site !== 'none') return { ok: false, reason: `Sec-Fetch-Site: ${site}` };
  const origin = headers.get('origin');
  if (origin !== null && !allowedOrigins.has(origin)) return { ok: false, reason: `Origin: ${origin}` };
  if (origin === null && site === null) {
    // Older browsers without Fetch Metadata still send a Referer on form posts; check it when present.
    const referer = headers.get('referer');
    if (referer) {
      try {
        if (!allowedOrigins.has(new URL(referer).origin)) return { ok: false, reason: 'Referer from another site' };
      } catch {
        return { ok: false, reason: 'Referer unreadable' };
      }
    }
  }
  return { ok: true };
}
