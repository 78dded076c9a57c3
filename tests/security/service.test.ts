import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createClient } from '@libsql/client';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { toroidCoil } from '../api/designs-fixtures';
import { createDesign, signUp as signedUp, uniqueEmail } from '../helpers/accounts';

function wrongSignIn(base: string, email: string, headers: Record<string, string> = {}) {
  return fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base, ...headers },
    body: JSON.stringify({ email, password: 'not-the-password-1' }),
  });
}

function expectSecurityHeaders(r: Response, what: string) {
  const csp = r.headers.get('content-security-policy') ?? '';
  expect(csp, what).toContain("frame-ancestors 'none'");
  expect(r.headers.get('x-content-type-options'), what).toBe('nosniff');
  expect(r.headers.get('referrer-policy'), what).toBe('strict-origin-when-cross-origin');
  expect(r.headers.get('x-frame-options'), what).toBe('DENY');
}

describe('served directly (no trusted proxy)', () => {
  let s: TestServer;
  beforeAll(async () => {
    s = await startServer({ COILWRIGHT_AUTH_RATE_LIMIT: '5', COILWRIGHT_SOLVE_RATE_LIMIT: '3' });
  });
  afterAll(async () => {
    await s?.stop();
  });

  it('a different X-Forwarded-For on each attempt does not reset the sign-in limit', async () => {
    const email = uniqueEmail('spoof');
    const statuses: number[] = [];
    for (let i = 0; i < 8; i++) {
      const r = await wrongSignIn(s.url, email, { 'x-forwarded-for': `198.51.100.${i + 1}` });
      statuses.push(r.status);
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5)).toEqual([429, 429, 429]);
  });

  it('every response carries the security headers: pages, API, static files, errors', async () => {
    const page = await fetch(`${s.url}/`);
    expectSecurityHeaders(page, '/');
    const html = await page.text();
    const csp = page.headers.get('content-security-policy')!;
    const scriptSrc = csp.split(';').map((d) => d.trim()).find((d) => d.startsWith('script-src'))!;
    expect(scriptSrc).not.toContain('unsafe-inline');
    expect(scriptSrc).not.toContain('unsafe-eval');
    // Each inline script of a page with islands is allowed by its own hash.
    const signIn = await fetch(`${s.url}/sign-in`);
    const signInCsp = signIn.headers.get('content-security-policy')!;
    const inline = [...(await signIn.text()).matchAll(/<script>([\s\S]*?)<\/script>/g)].map((m) => m[1]);
    expect(inline.length).toBeGreaterThan(0);
    for (const body of inline) expect(signInCsp).toContain(`'sha256-${createHash('sha256').update(body).digest('base64')}'`);

    const asset = /\/_astro\/[^"']+\.js/.exec(await (await fetch(`${s.url}/designs/new`)).text())?.[0] ?? /\/_astro\/[^"']+\.css/.exec(html)?.[0];
    expect(asset).toBeTruthy();
    for (const path of ['/api/v1/me', '/api/v1/designs/nope', '/favicon.svg', asset!, '/no-such-page', '/validation']) {
      const r = await fetch(`${s.url}${path}`);
      expectSecurityHeaders(r, path);
      await r.arrayBuffer();
    }
    expect((await fetch(`${s.url}/`)).headers.get('strict-transport-security')).toBeNull();
  });

  it('cross-origin state-changing requests are refused on /api/v1 and pages; requests without Origin pass', async () => {
    const { c } = await signedUp(s.url, 'Origin Olga');
    const before = (await (await c.get('/api/v1/designs')).json()).designs.length;
    const evil = { origin: 'https://evil.example' };
    const refusedPost = await c.req('POST', '/api/v1/designs', { name: 'From elsewhere', design: toroidCoil }, evil);
    expect(refusedPost.status).toBe(403);
    const body = await refusedPost.json();
    expect(body.error.code).toBe('forbidden');
    expect(typeof body.error.message).toBe('string');
    expectSecurityHeaders(refusedPost, 'refused');
    const fetchMeta = await c.req('POST', '/api/v1/designs', { name: 'Cross site', design: toroidCoil }, { origin: s.url, 'sec-fetch-site': 'cross-site' });
    expect(fetchMeta.status).toBe(403);
    const { id } = await createDesign(c, 'Mine');
    expect((await c.req('PUT', `/api/v1/designs/${id}`, { name: 'Renamed', design: toroidCoil, revision: 1 }, evil)).status).toBe(403);
    expect((await c.req('DELETE', `/api/v1/designs/${id}`, undefined, evil)).status).toBe(403);
    expect((await c.req('POST', '/sign-out', undefined, evil)).status).toBe(403);
    const after = await (await c.get('/api/v1/designs')).json();
    expect(after.designs.length).toBe(before + 1);
    expect(after.designs.find((d: { id: string }) => d.id === id).name).toBe('Mine');
    // A program (no Origin, no Fetch Metadata) with the session cookie is not a browser being tricked.
    const cookie = [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    const noOrigin = await fetch(`${s.url}/api/v1/designs`, { method: 'POST', headers: { cookie, 'content-type': 'application/json' }, body: JSON.stringify({ name: 'Scripted', design: toroidCoil }) });
    expect(noOrigin.status).toBe(201);
  });

  it('the solve endpoint reports its limit and, past it, answers 429 with Retry-After', async () => {
    const solve = () => fetch(`${s.url}/api/v1/solve`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(toroidCoil) });
    const first = await solve();
    expect(first.status).toBe(200);
    expect(first.headers.get('ratelimit-policy')).toBe('"solve";q=3;w=60');
    expect(first.headers.get('ratelimit')).toMatch(/^"solve";r=2;t=\d+$/);
    await solve();
    await solve();
    const refused = await solve();
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(refused.headers.get('ratelimit')).toMatch(/^"solve";r=0;t=\d+$/);
    expect((await refused.json()).error.code).toBe('rate_limited');
    // Spoofed forwarding headers do not buy a new allowance.
    expect((await fetch(`${s.url}/api/v1/solve`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-forwarded-for': '192.0.2.77' }, body: JSON.stringify(toroidCoil) })).status).toBe(429);
  });
});

describe('behind a trusted proxy over HTTPS', () => {
  let s: TestServer;
  beforeAll(async () => {
    s = await startServer({
      TRUSTED_PROXIES: '127.0.0.1, ::1',
      COILWRIGHT_AUTH_RATE_LIMIT: '1000',
      COILWRIGHT_ACCOUNT_SIGN_IN_LIMIT: '3',
      BETTER_AUTH_URL: 'https://coils.example.test',
    });
  });
  afterAll(async () => {
    await s?.stop();
  });

  it('counts failed sign-ins per account across addresses; other accounts are unaffected', async () => {
    const c = new Client(s.url);
    const email = uniqueEmail('target');
    await c.signUp('Target Tom', email, 'correct-horse-9');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await wrongSignIn(s.url, email, { 'x-forwarded-for': `203.0.113.${i + 10}` })).status);
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    // Even the right password is refused while the account is held, from a fresh address.
    const right = await fetch(`${s.url}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: s.url, 'x-forwarded-for': '203.0.113.99' },
      body: JSON.stringify({ email, password: 'correct-horse-9' }),
    });
    expect(right.status).toBe(429);
    expect(Number(right.headers.get('retry-after'))).toBeGreaterThan(0);
    const other = uniqueEmail('bystander');
    expect((await wrongSignIn(s.url, other, { 'x-forwarded-for': '203.0.113.10' })).status).toBe(401);
  });

  it('sends HSTS and Secure session cookies when the proxy says the request came over HTTPS', async () => {
    const r = await fetch(`${s.url}/`, { headers: { 'x-forwarded-proto': 'https' } });
    expect(r.headers.get('strict-transport-security')).toMatch(/max-age=\d{7,}/);
    const plain = await fetch(`${s.url}/`);
    expect(plain.headers.get('strict-transport-security')).toBeNull();
    const up = await fetch(`${s.url}/api/auth/sign-up/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: s.url, 'x-forwarded-proto': 'https' },
      body: JSON.stringify({ name: 'Secure Sam', email: uniqueEmail('secure'), password: 'correct-horse-9' }),
    });
    expect(up.status).toBe(200);
    const cookies = up.headers.getSetCookie();
    const session = cookies.find((c) => c.includes('session_token='));
    expect(session).toMatch(/^__Secure-/);
    expect(session).toMatch(/;\s*Secure/i);
    expect(session).toMatch(/;\s*HttpOnly/i);
  });
});

describe('session cookie cache', () => {
  let s: TestServer;
  beforeAll(async () => {
    s = await startServer({ COILWRIGHT_SESSION_CACHE_SECONDS: '2' });
  });
  afterAll(async () => {
    await s?.stop();
  });

  async function untilRefused(c: Client, limitMs: number): Promise<number> {
    const t0 = Date.now();
    for (;;) {
      const r = await c.get('/api/v1/me');
      if (r.status === 401) return Date.now() - t0;
      expect(r.status).toBe(200);
      if (Date.now() - t0 > limitMs) return Infinity;
      await new Promise((ok) => setTimeout(ok, 250));
    }
  }

  it('a copy of a signed-out session stops working within the cache lifetime', async () => {
    const { c } = await signedUp(s.url, 'Copy Carla');
    const copy = new Client(s.url);
    copy.cookies = new Map(c.cookies);
    expect((await copy.get('/api/v1/me')).status).toBe(200);
    expect((await c.post('/api/auth/sign-out', {})).status).toBe(200);
    expect((await c.get('/api/v1/me')).status).toBe(401);
    expect(await untilRefused(copy, 6000)).toBeLessThan(6000);
  });

  it('a user disabled by an admin loses access within the cache lifetime', async () => {
    const adminUser = await signedUp(s.url, 'Admin Ada');
    const db = createClient({ url: `file:${join(s.dataDir, 'test.db')}` });
    await db.execute({ sql: "UPDATE user SET role = 'admin' WHERE id = ?", args: [adminUser.id] });
    db.close();
    const admin = new Client(s.url);
    await admin.signIn(adminUser.email);
    const target = await signedUp(s.url, 'Banned Ben');
    expect((await target.c.get('/api/v1/me')).status).toBe(200);
    const ban = await admin.post('/api/auth/admin/ban-user', { userId: target.id, banReason: 'left the group' });
    expect(ban.status).toBe(200);
    expect(await untilRefused(target.c, 6000)).toBeLessThan(6000);
  });
});
