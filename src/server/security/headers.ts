import { createHash } from 'node:crypto';

/**
 * Security headers for every response (pages, API, static files). Content-Security-Policy follows the
 * CSP Level 3 recommendation (W3C, "Content Security Policy Level 3"): scripts only from this origin
 * plus the exact inline scripts a page carries, allowed by their SHA-256 hashes (Astro's island loader
 * and hydration-directive scripts), never 'unsafe-inline' for scripts. Styles keep 'unsafe-inline':
 * Astro emits an inline <style> for islands and the charts set style attributes.
 */
const BASE_POLICY = [
  "default-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
];

/** For responses that are not HTML (JSON, files): nothing may run or be framed. */
export const NON_HTML_CSP = "default-src 'none'; frame-ancestors 'none'";

/**
 * For the site's own script files. A script started as a worker runs under its response's policy, and the
 * solver worker imports its lazily loaded chunks (the unit library), so scripts may load scripts of this
 * origin; nothing else is allowed.
 */
export const SCRIPT_FILE_CSP = "default-src 'none'; script-src 'self'; frame-ancestors 'none'";

/** One year, with subdomains (RFC 6797; one year is the preload list's minimum, common practice). */
export const HSTS = 'max-age=31536000; includeSubDomains';

const INLINE_SCRIPT = /<script\b([^>]*)>([\s\S]*?)<\/script>/gi;

/** SHA-256 source expressions of the inline scripts in an HTML document (those without src and not JSON data). */
export function inlineScriptHashes(html: string): string[] {
  const out = new Set<string>();
  for (const m of html.matchAll(INLINE_SCRIPT)) {
    const attrs = m[1];
    if (/\bsrc\s*=/i.test(attrs)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase();
    if (type && type !== 'module' && type !== 'text/javascript' && type !== 'application/javascript') continue;
    out.add(`'sha256-${createHash('sha256').update(m[2], 'utf8').digest('base64')}'`);
  }
  return [...out];
}

export function htmlCsp(html: string): string {
  const scripts = ["'self'", ...inlineScriptHashes(html)].join(' ');
  return [...BASE_POLICY, `script-src ${scripts}`].join('; ');
}

/** Headers that do not depend on the body. `https`: the request reached us over TLS (directly or via a trusted proxy). */
export function commonSecurityHeaders(https: boolean): Record<string, string> {
  const h: Record<string, string> = {
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'strict-origin-when-cross-origin',
    'X-Frame-Options': 'DENY',
    'Cross-Origin-Opener-Policy': 'same-origin',
    'Cross-Origin-Resource-Policy': 'same-origin',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=(), usb=()',
  };
  if (https) h['Strict-Transport-Security'] = HSTS;
  return h;
}

export function isHtml(contentType: string | null | undefined): boolean {
  return !!contentType && contentType.toLowerCase().startsWith('text/html');
}
