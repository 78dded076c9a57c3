/**
 * The server `npm start` listens with, in front of the Astro Node handler:
 * - the client's address: X-Forwarded-For (and -Proto) count only from TRUSTED_PROXIES; otherwise they
 *   are replaced by the socket's peer address, so a client cannot choose its own rate-limit key;
 * - every static file of dist/client (the adapter runs in middleware mode and serves none itself): the
 *   .br / .gz sibling written at build when the client accepts it,
 *   long-lived immutable caching for the fingerprinted /_astro/* files;
 * - the security headers on every response, static files included (rendered responses get theirs,
 *   with the page's CSP, from the middleware);
 * - the signed-in read of a design, and a repeat visit to a design page already rendered, answered with the
 *   app's own services when the session is at hand, and POST /api/v1/solve (fast-answers.ts); everything
 *   else goes to the app.
 */
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import { createServer as createTlsServer } from 'node:https';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { extname, join, relative, sep } from 'node:path';
import { acceptsEncoding, pickEncoding } from '../../src/server/security/compress';
import { resolveClientAddress, isTrusted, trustedProxyList } from '../../src/server/security/client-address';
import { commonSecurityHeaders, htmlCsp, NON_HTML_CSP, SCRIPT_FILE_CSP } from '../../src/server/security/headers';
import { HTTPS_HEADER } from '../../src/server/security/forwarded';
import { pageKey, storedPage } from '../../src/server/security/page-cache';
import { fastRead, fastSolve, sendError } from './fast-answers';
import { ApiError } from '../../src/server/http';

type Handler = (req: IncomingMessage, res: ServerResponse) => void;

const TYPES: Record<string, string> = {
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.html': 'text/html; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.json': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.xml': 'application/xml',
  '.webmanifest': 'application/manifest+json',
  '.map': 'application/json; charset=utf-8',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
};

type StaticFile = { path: string; type: string; size: number; etag: string; br?: string; gz?: string; csp: string };

/** Index of dist/client at start: which URL paths are files, and which have compressed siblings. */
export function indexClientDir(clientDir: string): Map<string, StaticFile> {
  const files = new Map<string, StaticFile>();
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (!p.endsWith('.br') && !p.endsWith('.gz')) {
        const ext = extname(p);
        const type = TYPES[ext] ?? 'application/octet-stream';
        const st = statSync(p);
        const url = '/' + relative(clientDir, p).split(sep).join('/');
        const has = (s: string) => {
          try {
            return statSync(p + s).isFile() ? p + s : undefined;
          } catch {
            return undefined;
          }
        };
        const csp = ext === '.html' ? htmlCsp(readFileSync(p, 'utf8')) : ext === '.js' || ext === '.mjs' ? SCRIPT_FILE_CSP : NON_HTML_CSP;
        const f: StaticFile = { path: p, type, size: st.size, etag: `"${st.size.toString(16)}-${Math.floor(st.mtimeMs).toString(16)}"`, br: has('.br'), gz: has('.gz'), csp };
        files.set(url, f);
        if (url.endsWith('/index.html')) {
          files.set(url.slice(0, -'index.html'.length), f);
          files.set(url.slice(0, -'/index.html'.length) || '/', f);
        }
      }
    }
  };
  walk(clientDir);
  return files;
}

function sendFile(req: IncomingMessage, res: ServerResponse, f: StaticFile, encoding: 'br' | 'gzip' | null, body: Buffer, url: string) {
  res.setHeader('Content-Type', f.type);
  if (encoding) res.setHeader('Content-Encoding', encoding);
  if (encoding || f.br || f.gz) res.setHeader('Vary', 'Accept-Encoding');
  res.setHeader('ETag', encoding ? `${f.etag.slice(0, -1)}-${encoding}"` : f.etag);
  res.setHeader('Cache-Control', url.startsWith('/_astro/') ? 'public, max-age=31536000, immutable' : 'public, max-age=0, must-revalidate');
  if (req.headers['if-none-match'] === res.getHeader('ETag')) {
    res.statusCode = 304;
    res.end();
    return;
  }
  res.setHeader('Content-Length', body.byteLength);
  res.statusCode = 200;
  res.end(req.method === 'HEAD' ? undefined : body);
}

export function frontHandler(app: Handler, clientDir: string, trustedSpec: string | undefined): Handler {
  const trusted = trustedProxyList(trustedSpec);
  const files = indexClientDir(clientDir);
  const bodies = new Map<string, Buffer>();
  const read = (file: string) => {
    let b = bodies.get(file);
    if (!b) bodies.set(file, (b = readFileSync(file)));
    return b;
  };
  return (req, res) => {
    const peer = req.socket.remoteAddress ?? '';
    const fromProxy = isTrusted(trusted, peer);
    const encrypted = 'encrypted' in req.socket && Boolean((req.socket as { encrypted?: boolean }).encrypted);
    const forwardedProto = String(req.headers['x-forwarded-proto'] ?? '').split(',')[0].trim().toLowerCase();
    const https = encrypted || (fromProxy && forwardedProto === 'https');
    // Astro takes the client address from the first X-Forwarded-For entry: leave exactly the resolved one.
    req.headers['x-forwarded-for'] = resolveClientAddress(peer, req.headers['x-forwarded-for'], trusted);
    if (!fromProxy) {
      delete req.headers['x-forwarded-proto'];
      delete req.headers['x-forwarded-host'];
      delete req.headers['x-forwarded-port'];
    }
    if (https) req.headers[HTTPS_HEADER] = '1';
    else delete req.headers[HTTPS_HEADER];

    for (const [k, v] of Object.entries(commonSecurityHeaders(https))) res.setHeader(k, v);

    if (req.method === 'GET' || req.method === 'HEAD') {
      const [url, query] = (req.url ?? '/').split('#')[0].split('?');
      // A page that is the same for everyone, already rendered by the app for a visitor without a session.
      const key = req.method === 'GET' ? pageKey('GET', url, query === undefined ? '' : `?${query}`, req.headers.cookie, req.headers['accept-encoding'] as string | undefined) : null;
      const page = key ? storedPage(key) : undefined;
      if (page) {
        // HSTS follows this request's scheme (set above), not the one of the request that filled the store.
        res.writeHead(page.status, Object.fromEntries(page.headers.filter(([k]) => k !== 'strict-transport-security')));
        res.end(page.body);
        return;
      }
      let path: string | null = null;
      try {
        path = decodeURIComponent(url);
      } catch {
        path = null;
      }
      const f = path ? files.get(path) : undefined;
      if (f && path) {
        res.setHeader('Content-Security-Policy', f.csp);
        const accept = req.headers['accept-encoding'] as string | undefined;
        const enc = pickEncoding(accept);
        const choice: ['br' | 'gzip', string] | null =
          enc === 'br' && f.br ? ['br', f.br] : enc && f.gz && acceptsEncoding(accept, 'gzip') ? ['gzip', f.gz] : null;
        if (choice) sendFile(req, res, f, choice[0], read(choice[1]), path);
        else sendFile(req, res, f, null, read(f.path), path);
        return;
      }
    }
    if (req.method === 'GET' && (req.url?.startsWith('/api/v1/designs/') || req.url?.startsWith('/designs/'))) {
      fastRead(req, res).then(
        (done) => done || app(req, res),
        () => app(req, res),
      );
      return;
    }
    if (req.method === 'POST' && req.url === '/api/v1/solve') {
      fastSolve(req, res).then(
        (done) => done || app(req, res),
        (e) => {
          console.error('[front]', e);
          if (!res.headersSent) void sendError(res, new ApiError('internal_error'), {});
        },
      );
      return;
    }
    app(req, res);
  };
}

/** Listens like the adapter's standalone server would (HTTPS when SERVER_CERT_PATH and SERVER_KEY_PATH are set). */
export function listen(handler: Handler, host: string, port: number): Promise<Server> {
  const server =
    process.env.SERVER_CERT_PATH && process.env.SERVER_KEY_PATH
      ? createTlsServer({ key: readFileSync(process.env.SERVER_KEY_PATH), cert: readFileSync(process.env.SERVER_CERT_PATH) }, handler)
      : createServer(handler);
  server.keepAliveTimeout = 65_000;
  return new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(port, host, () => ok(server));
  });
}
