import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';

const br = promisify(brotliCompress);
const gz = promisify(gzip);

export type Encoding = 'br' | 'gzip';

function offeredEncodings(accept: string): Map<string, number> {
  const offered = new Map<string, number>();
  for (const part of accept.toLowerCase().split(',')) {
    const [name, ...params] = part.trim().split(';');
    const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    offered.set(name.trim(), q ? Number(q.slice(2)) : 1);
  }
  return offered;
}

export function acceptsEncoding(accept: string | null | undefined, name: string): boolean {
  if (!accept) return false;
  const offered = offeredEncodings(accept);
  return (offered.get(name) ?? offered.get('*') ?? 0) > 0;
}

/** Brotli when the client accepts it, gzip otherwise (RFC 9110 §12.5.3 Accept-Encoding; q=0 refuses). */
export function pickEncoding(accept: string | null | undefined): Encoding | null {
  if (acceptsEncoding(accept, 'br')) return 'br';
  if (acceptsEncoding(accept, 'gzip')) return 'gzip';
  return null;
}

const TEXT_TYPES = /^(text\/|application\/(json|javascript|xml|manifest\+json|problem\+json|ld\+json)|image\/svg\+xml)/i;

export function isCompressible(contentType: string | null | undefined): boolean {
  return !!contentType && TEXT_TYPES.test(contentType) && !/event-stream/i.test(contentType);
}

/** Bodies below this size are sent as they are: the framing would outweigh the saving. */
export const MIN_COMPRESS_BYTES = 1024;

/**
 * Compresses a buffered body for the wire. Brotli at quality 5 for bodies made per request (the
 * quality/speed balance of common practice for dynamic content), 11 for files compressed at build.
 */
export async function encodeBody(body: Uint8Array, encoding: Encoding, atBuild = false): Promise<Uint8Array> {
  if (encoding === 'br') {
    return br(body, {
      params: {
        [constants.BROTLI_PARAM_QUALITY]: atBuild ? 11 : 5,
        [constants.BROTLI_PARAM_SIZE_HINT]: body.byteLength,
        [constants.BROTLI_PARAM_MODE]: constants.BROTLI_MODE_TEXT,
      },
    });
  }
  return gz(body, { level: atBuild ? 9 : 6 });
}

export function appendVary(headers: Headers, value: string): void {
  const current = headers.get('vary');
  if (!current) headers.set('vary', value);
  else if (!current.toLowerCase().split(/\s*,\s*/).includes(value.toLowerCase())) headers.set('vary', `${current}, ${value}`);
}
