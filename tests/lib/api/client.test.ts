import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { ApiFailure, api, failureMessage } from '~/lib/api/client';
import { errorMessages } from '~/lib/errors';

// A real HTTP server on a free port answers the way the API (or a proxy in front of it) can answer.
type Seen = { method: string; url: string; type: string | undefined; body: string };
let server: Server;
let base: string;
const seen: Seen[] = [];

function send(res: ServerResponse, status: number, type: string | null, body: string) {
  res.writeHead(status, type ? { 'content-type': type } : {});
  res.end(body);
}

function route(req: IncomingMessage, res: ServerResponse, body: string) {
  seen.push({ method: req.method ?? '', url: req.url ?? '', type: req.headers['content-type'], body });
  switch (req.url) {
    case '/api/v1/ok':
      return send(res, 200, 'application/json', JSON.stringify({ designs: [{ id: 'd1' }] }));
    case '/api/v1/echo':
      return send(res, 201, 'application/json', body || 'null');
    case '/api/v1/gone':
      res.writeHead(204);
      return res.end();
    case '/api/v1/text':
      return send(res, 200, 'text/plain; charset=utf-8', 'Harbour Lane coil, 190 kHz');
    case '/api/v1/invalid':
      return send(
        res,
        400,
        'application/json',
        JSON.stringify({
          error: {
            code: 'validation_failed',
            message: 'Some fields need attention.',
            issues: [
              { path: 'design.secondary.turns', message: 'Turns must be a whole number.' },
              { path: 'name', message: 'Give the design a name.' },
              { path: 'name', message: 'a second message for the same field' },
            ],
          },
        }),
      );
    case '/api/v1/conflict':
      return send(res, 409, 'application/json', JSON.stringify({ error: { code: 'conflict', message: 'revision 3 is not the latest (4)', latestRevision: 4 } }));
    case '/api/v1/proxy-page':
      return send(res, 502, 'text/html', '<html><body>Bad gateway</body></html>');
    case '/api/v1/broken-json':
      return send(res, 200, 'application/json', '{"designs": [');
    case '/api/v1/upload':
      return send(res, 415, 'application/json', JSON.stringify({ error: { code: 'unsupported_media_type', message: 'notes.exe is not an accepted kind of file.' } }));
    case '/api/v1/server-fault':
      return send(res, 500, 'application/json', JSON.stringify({ error: { code: 'internal_error', message: 'SQLITE_BUSY: database is locked' } }));
    case '/api/v1/forbidden':
      return send(res, 403, 'application/json', JSON.stringify({ error: { code: 'forbidden', message: 'not yours' } }));
    default:
      return send(res, 404, 'application/json', JSON.stringify({ error: { code: 'not_found', message: 'Not found.' } }));
  }
}

beforeAll(async () => {
  server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => route(req, res, Buffer.concat(chunks).toString('utf8')));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  // the browser resolves the client's relative paths against the page; here, against the test server
  const realFetch = globalThis.fetch;
  vi.stubGlobal('fetch', (input: string, init?: RequestInit) => realFetch(new URL(input, base), init));
});

afterAll(async () => {
  vi.unstubAllGlobals();
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

async function failure(p: Promise<unknown>): Promise<ApiFailure> {
  try {
    await p;
  } catch (e) {
    expect(e).toBeInstanceOf(ApiFailure);
    return e as ApiFailure;
  }
  throw new Error('the call did not fail');
}

describe('api client', () => {
  it('returns the parsed JSON of a success and sends a JSON body with its type', async () => {
    await expect(api.get('/api/v1/ok')).resolves.toEqual({ designs: [{ id: 'd1' }] });
    await expect(api.post('/api/v1/echo', { name: 'Harbour Lane 4"' })).resolves.toEqual({ name: 'Harbour Lane 4"' });
    const sent = seen.find((s) => s.url === '/api/v1/echo')!;
    expect(sent.method).toBe('POST');
    expect(sent.type).toBe('application/json');
  });

  it('sends FormData as multipart, not as JSON', async () => {
    const form = new FormData();
    form.set('file', new Blob(['f,dB\n1,2\n'], { type: 'text/csv' }), 'sweep.csv');
    await api.post('/api/v1/echo', form).catch(() => undefined);
    const sent = seen.filter((s) => s.url === '/api/v1/echo').at(-1)!;
    expect(sent.type).toMatch(/^multipart\/form-data; boundary=/);
    expect(sent.body).toContain('filename="sweep.csv"');
  });

  it('resolves 204 with undefined and a text answer with its text', async () => {
    await expect(api.delete('/api/v1/gone')).resolves.toBeUndefined();
    await expect(api.get<string>('/api/v1/text')).resolves.toBe('Harbour Lane coil, 190 kHz');
  });

  it('turns a 400 into an ApiFailure with its code, the server message and the issues by path', async () => {
    const f = await failure(api.put('/api/v1/invalid', { design: {} }));
    expect(f.status).toBe(400);
    expect(f.code).toBe('validation_failed');
    expect(f.message).toBe('Some fields need attention.');
    expect(f.issues).toHaveLength(3);
    expect(f.byPath).toEqual({ 'design.secondary.turns': 'Turns must be a whole number.', name: 'Give the design a name.' });
    expect(f.offline).toBe(false);
    expect(f.conflict).toBe(false);
  });

  it('words every 409 the same, whatever the server wrote, and keeps the extra members', async () => {
    const f = await failure(api.put('/api/v1/conflict', { revision: 3 }));
    expect(f.status).toBe(409);
    expect(f.conflict).toBe(true);
    expect(f.code).toBe('conflict');
    expect(f.message).toBe(errorMessages.conflict);
    expect(f.extra).toEqual({ latestRevision: 4 });
  });

  it('uses our words for a known code rather than the server text', async () => {
    const f = await failure(api.get('/api/v1/forbidden'));
    expect(f.message).toBe(errorMessages.forbidden);
  });

  it('keeps the server sentence of a refused request, and never a server fault text', async () => {
    expect((await failure(api.post('/api/v1/upload', new FormData()))).message).toBe('notes.exe is not an accepted kind of file.');
    const f = await failure(api.get('/api/v1/server-fault'));
    expect(f.status).toBe(500);
    expect(f.message).toBe(errorMessages.internal_error);
  });

  it('explains an error answer that is not JSON by its status', async () => {
    const f = await failure(api.get('/api/v1/proxy-page'));
    expect(f.status).toBe(502);
    expect(f.issues).toEqual([]);
    expect(f.message).toBe(errorMessages.unknown);
    expect(f.message).not.toContain('<html>');
  });

  it('refuses a success whose JSON cannot be read', async () => {
    const f = await failure(api.get('/api/v1/broken-json'));
    expect(f.code).toBe('bad_response');
    expect(f.message).toBe(errorMessages.bad_response);
  });

  it('reports an unreachable server as offline with the one offline message', async () => {
    const closed = createServer();
    await new Promise<void>((resolve) => closed.listen(0, '127.0.0.1', resolve));
    const port = (closed.address() as AddressInfo).port;
    await new Promise<void>((resolve) => closed.close(() => resolve()));
    const f = await failure(api.get(`http://127.0.0.1:${port}/api/v1/ok`));
    expect(f.status).toBe(0);
    expect(f.offline).toBe(true);
    expect(f.code).toBe('network_error');
    expect(f.message).toBe(errorMessages.network_error);
    expect(failureMessage(f)).toBe(errorMessages.network_error);
    expect(failureMessage(new TypeError('x'))).toBe(errorMessages.unknown);
  });
});
