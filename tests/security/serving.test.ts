import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { request } from 'node:http';
import { startServer, type TestServer } from '../helpers/server';
import { toroidCoil } from '../api/designs-fixtures';
import { signUp as signedUp } from '../helpers/accounts';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

/** A raw GET (fetch would decode the body and hide the encoding). */
function rawGet(path: string, headers: Record<string, string> = {}, method = 'GET'): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Buffer }> {
  return new Promise((ok, fail) => {
    const req = request(`${s.url}${path}`, { method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c) => chunks.push(c));
      res.on('end', () => ok({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on('error', fail);
    req.end();
  });
}

describe('npm start serving', () => {
  it('serves every built static file itself: fonts and images with their type, a year-long cache for fingerprinted ones, 304 on a matching ETag', async () => {
    const page = (await rawGet('/')).body.toString('utf8');
    const css = page.match(/\/_astro\/[^"']+\.css/)?.[0];
    expect(css).toBeTruthy();
    const sheet = (await rawGet(css!)).body.toString('utf8');
    const font = sheet.match(/\/_astro\/[^)"']+\.woff2/)?.[0];
    expect(font).toBeTruthy();
    const f = await rawGet(font!);
    expect(f.status).toBe(200);
    expect(f.headers['content-type']).toBe('font/woff2');
    expect(f.headers['cache-control']).toContain('immutable');
    expect(f.body.byteLength).toBe(Number(f.headers['content-length']));
    expect((await rawGet(font!, { 'if-none-match': String(f.headers.etag) })).status).toBe(304);
    const icon = await rawGet('/favicon.svg');
    expect(icon.status).toBe(200);
    expect(icon.headers['content-type']).toBe('image/svg+xml');
    expect(icon.headers['x-content-type-options']).toBe('nosniff');
    expect((await rawGet('/no-such-file.woff2')).status).toBe(404);
  });

  it('sends pages brotli- or gzip-compressed by what the client accepts, and plain to one that accepts neither', async () => {
    const br = await rawGet('/methods', { 'accept-encoding': 'gzip, deflate, br' });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(String(br.headers.vary)).toMatch(/accept-encoding/i);
    const html = brotliDecompressSync(br.body).toString('utf8');
    expect(html.toLowerCase()).toContain('<!doctype html>');
    const gz = await rawGet('/methods', { 'accept-encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString('utf8')).toBe(html);
    const plain = await rawGet('/methods');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString('utf8')).toBe(html);
  });

  it('serves the build-time .br / .gz of fingerprinted assets with a year-long immutable cache', async () => {
    const html = (await rawGet('/designs/new')).body.toString('utf8');
    const asset = /\/_astro\/[^"']+\.js/.exec(html)?.[0];
    expect(asset).toBeTruthy();
    const plain = await rawGet(asset!);
    const br = await rawGet(asset!, { 'accept-encoding': 'br' });
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(String(br.headers['content-type'])).toMatch(/javascript/);
    expect(brotliDecompressSync(br.body).equals(plain.body)).toBe(true);
    expect(br.body.length).toBeLessThan(plain.body.length);
    const gz = await rawGet(asset!, { 'accept-encoding': 'gzip;q=1, br;q=0' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).equals(plain.body)).toBe(true);
    const again = await rawGet(asset!, { 'accept-encoding': 'br', 'if-none-match': String(br.headers.etag) });
    expect(again.status).toBe(304);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('compresses API JSON', async () => {
    const res = await fetch(`${s.url}/api/v1/solve`, { method: 'POST', headers: { 'content-type': 'application/json', 'accept-encoding': 'br' }, body: JSON.stringify(toroidCoil) });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-encoding')).toBe('br');
    expect((await res.json()).secondary.inductance).toBeGreaterThan(0);
  });

  it('pages the same for everyone are served from memory to visitors without a session, and signed-in visitors see their own header', async () => {
    const a = await rawGet('/validation', { 'accept-encoding': 'br' });
    const b = await rawGet('/validation', { 'accept-encoding': 'br' });
    expect(b.body.equals(a.body)).toBe(true);
    expect(brotliDecompressSync(a.body).toString()).not.toContain('Signed in as');
    const { c } = await signedUp(s.url, 'Header Hana');
    const mine = await c.get('/validation');
    expect(await mine.text()).toContain('Header Hana');
    const home = await c.get('/');
    expect(await home.text()).toContain('Header Hana');
    expect(await (await fetch(`${s.url}/`)).text()).not.toContain('Header Hana');
  });
});
