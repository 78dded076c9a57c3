import { appendVary, encodeBody, isCompressible, MIN_COMPRESS_BYTES, pickEncoding } from './compress';
import { commonSecurityHeaders, htmlCsp, isHtml, NON_HTML_CSP } from './headers';

export type FinishOptions = {
  https: boolean;
  extraHeaders?: Record<string, string>;
  setCookies?: string[];
  /** False under `astro dev`, whose injected inline scripts change with every edit. */
  csp?: boolean;
};

const NO_BODY = new Set([101, 204, 205, 304]);

/**
 * The last step of every response the app renders: security headers (a CSP with the hashes of the
 * page's own inline scripts for HTML), rate-limit and session-cookie headers, and compression of
 * text bodies for clients that accept it. Headers a route set itself are kept.
 */
export async function finishResponse(request: Request, response: Response, o: FinishOptions): Promise<Response> {
  const headers = new Headers(response.headers);
  for (const [k, v] of Object.entries(commonSecurityHeaders(o.https))) if (!headers.has(k)) headers.set(k, v);
  for (const [k, v] of Object.entries(o.extraHeaders ?? {})) headers.set(k, v);
  for (const c of o.setCookies ?? []) headers.append('set-cookie', c);

  const type = headers.get('content-type');
  const html = isHtml(type);
  const compressible = isCompressible(type) && !headers.has('content-encoding') && !NO_BODY.has(response.status);
  const csp = o.csp ?? true;
  if (csp && !html && !headers.has('content-security-policy')) headers.set('content-security-policy', NON_HTML_CSP);
  if (!html && !compressible) {
    return new Response(response.body, { status: response.status, statusText: response.statusText, headers });
  }
  if (compressible) appendVary(headers, 'Accept-Encoding');
  if (request.method === 'HEAD' || response.body === null) {
    return new Response(response.body, { status: response.status, statusText: response.statusText, headers });
  }
  let body: Uint8Array = new Uint8Array(await response.arrayBuffer());
  if (csp && html && !headers.has('content-security-policy')) headers.set('content-security-policy', htmlCsp(new TextDecoder().decode(body)));
  const encoding = compressible && body.byteLength >= MIN_COMPRESS_BYTES ? pickEncoding(request.headers.get('accept-encoding')) : null;
  if (encoding) {
    body = await encodeBody(body, encoding);
    headers.set('content-encoding', encoding);
  }
  headers.set('content-length', String(body.byteLength));
  return new Response(body as Uint8Array<ArrayBuffer>, { status: response.status, statusText: response.statusText, headers });
}
