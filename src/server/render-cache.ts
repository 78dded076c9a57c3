import { createHash } from 'node:crypto';

/**
 * Rendered HTML of signed-in pages, keyed by everything the render reads. A page computes its key from the
 * data it loaded (the viewer, the design row, the stored calibration, the review state, the address), answers
 * a hit with the stored HTML and skips the render; a miss renders, and the middleware keeps the HTML under the
 * key the page left in `Astro.locals.renderKey`. A key names its inputs rather than a time, so a change to any
 * of them is a new key and the old entry simply ages out: there is nothing to invalidate. Bounded to the most
 * recently used pages (count and bytes), per process.
 */
const MAX_ENTRIES = 200;
const MAX_BYTES = 16 * 1024 * 1024;

const g = globalThis as unknown as { __coilwrightRenders?: Map<string, string> };
const store = (g.__coilwrightRenders ??= new Map<string, string>());
let bytes = 0;

/** The cache key of a render: a digest of its inputs, in order (any JSON-serialisable values). */
export function renderKey(...parts: unknown[]): string {
  const h = createHash('sha256');
  for (const p of parts) h.update(JSON.stringify(p) ?? 'undefined').update('\u0000');
  return h.digest('base64url');
}

/** The stored HTML for a key as a fresh response, or null. */
export function cachedRender(key: string): Response | null {
  const html = store.get(key);
  if (html === undefined) return null;
  store.delete(key);
  store.set(key, html);
  return new Response(html, { status: 200, headers: { 'content-type': 'text/html; charset=utf-8' } });
}

/** Keeps a rendered 200 HTML page under its key and returns an equal response to send on. */
export async function keepRender(key: string, response: Response): Promise<Response> {
  if (response.status !== 200 || response.headers.has('set-cookie') || !(response.headers.get('content-type') ?? '').startsWith('text/html')) return response;
  const html = await response.text();
  if (!store.has(key)) {
    store.set(key, html);
    bytes += html.length;
    for (const [k, v] of store) {
      if (store.size <= MAX_ENTRIES && bytes <= MAX_BYTES) break;
      store.delete(k);
      bytes -= v.length;
    }
  }
  return new Response(html, { status: response.status, statusText: response.statusText, headers: response.headers });
}

/** Number of pages held (for tests). */
export function renderCacheSize(): number {
  return store.size;
}
