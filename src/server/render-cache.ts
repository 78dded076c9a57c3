import { createHash } from 'node:crypto';
import { htmlCsp } from './security/headers';
import { encodeBody, type Encoding } from './security/compress';

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

/** The page as sent: its bytes and its Content-Security-Policy (hashes of its inline scripts), both computed once. */
export type Rendered = { body: Uint8Array; csp: string; type: string; encoded?: Partial<Record<Encoding, Promise<Uint8Array>>> };
const g = globalThis as unknown as { __coilwrightRenders?: Map<string, Rendered> };
const store = (g.__coilwrightRenders ??= new Map<string, Rendered>());
let bytes = 0;

/** The cache key of a render: a digest of its inputs, in order (any JSON-serialisable values). */
export function renderKey(...parts: unknown[]): string {
  const h = createHash('sha256');
  for (const p of parts) h.update(JSON.stringify(p) ?? 'undefined').update('\u0000');
  return h.digest('base64url');
}

/** The stored HTML for a key as a fresh response, or null. */
export function cachedRender(key: string): Response | null {
  const hit = store.get(key);
  if (hit === undefined) return null;
  store.delete(key);
  store.set(key, hit);
  return responseOf(hit, new Headers({ 'content-type': hit.type }));
}

function responseOf(r: Rendered, headers: Headers): Response {
  // under `astro dev` pages carry no CSP (its injected scripts change with every edit)
  if (!import.meta.env.DEV) headers.set('content-security-policy', r.csp);
  return new Response(r.body.slice() as Uint8Array<ArrayBuffer>, { status: 200, headers });
}

/** Keeps a rendered 200 HTML page under its key and returns an equal response to send on. */
export async function keepRender(key: string, response: Response): Promise<Response> {
  if (response.status !== 200 || response.headers.has('set-cookie') || !(response.headers.get('content-type') ?? '').startsWith('text/html')) return response;
  const html = await response.text();
  let rendered = store.get(key);
  if (!rendered) {
    rendered = { body: new TextEncoder().encode(html), csp: htmlCsp(html), type: response.headers.get('content-type')! };
    store.set(key, rendered);
    bytes += rendered.body.byteLength;
    for (const [k, v] of store) {
      if (store.size <= MAX_ENTRIES && bytes <= MAX_BYTES) break;
      store.delete(k);
      bytes -= v.body.byteLength;
    }
  }
  return responseOf(rendered, new Headers(response.headers));
}

/** The stored page for a key, as the front server sends it itself; undefined when there is none. */
export function storedRender(key: string): Rendered | undefined {
  const hit = store.get(key);
  if (hit) {
    store.delete(key);
    store.set(key, hit);
  }
  return hit;
}

/** A stored page compressed for the wire, compressed once per encoding. */
export function encodedRender(r: Rendered, encoding: Encoding): Promise<Uint8Array> {
  r.encoded ??= {};
  return (r.encoded[encoding] ??= encodeBody(r.body, encoding));
}
