import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { Client, linkIn, waitForMail } from '../helpers/client';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

describe('accounts against a running server', () => {
  it('GET /api/v1/designs without a session is 401 with the contract error shape', async () => {
    const r = await fetch(`${s.url}/api/v1/designs`);
    expect(r.status).toBe(401);
    const body = await r.json();
    expect(body.error.code).toBe('unauthorized');
    expect(typeof body.error.message).toBe('string');
  });

  it('sign-up signs in at once, sends a verification mail with text and HTML, and the link verifies', async () => {
    const c = new Client(s.url);
    await c.signUp('Mira Sol', 'mira@example.test');
    const list = await c.get('/api/v1/designs');
    expect(list.status).toBe(200);
    expect(await list.json()).toEqual({ designs: [] });

    const mail = await waitForMail(s.url, 'mira@example.test', 'Confirm');
    expect(mail.text).toContain('http');
    expect(mail.html).toContain('<a href=');
    const me0 = await (await c.get('/api/v1/me')).json();
    expect(me0.user.emailVerified).toBe(false);

    const verify = await fetch(linkIn(mail.text), { redirect: 'manual' });
    expect([200, 302]).toContain(verify.status);
    const me = await (await c.get('/api/v1/me')).json();
    expect(me.user.emailVerified).toBe(true);
  });

  it('a duplicate sign-up is refused and the first account keeps its password', async () => {
    const c = new Client(s.url);
    await c.signUp('Ada One', 'dup@example.test', 'first-password-1');
    const again = await new Client(s.url).post('/api/auth/sign-up/email', { name: 'Ada Two', email: 'dup@example.test', password: 'second-password-2' });
    expect(again.status).toBeGreaterThanOrEqual(400);
    expect(JSON.stringify(await again.json())).toMatch(/exist/i);
    await new Client(s.url).signIn('dup@example.test', 'first-password-1');
    const wrong = await new Client(s.url).post('/api/auth/sign-in/email', { email: 'dup@example.test', password: 'second-password-2' });
    expect(wrong.status).toBe(401);
  });

  it('a too-short password is refused with a message and creates no account', async () => {
    const r = await new Client(s.url).post('/api/auth/sign-up/email', { name: 'Shorty', email: 'short@example.test', password: 'abc' });
    expect(r.status).toBe(400);
    expect(JSON.stringify(await r.json())).toMatch(/short/i);
    const signIn = await new Client(s.url).post('/api/auth/sign-in/email', { email: 'short@example.test', password: 'abc' });
    expect(signIn.status).toBe(401);
  });

  it('a wrong password is refused with a message', async () => {
    const c = new Client(s.url);
    await c.signUp('Wendel', 'wendel@example.test');
    const r = await new Client(s.url).post('/api/auth/sign-in/email', { email: 'wendel@example.test', password: 'not-the-password' });
    expect(r.status).toBe(401);
    expect((await r.json()).message).toMatch(/invalid email or password/i);
  });

  it('sign-out ends the session', async () => {
    const c = new Client(s.url);
    await c.signUp('Otto', 'otto@example.test');
    expect((await c.get('/api/v1/designs')).status).toBe(200);
    const out = await c.post('/api/auth/sign-out', {});
    expect(out.status).toBe(200);
    expect((await c.get('/api/v1/designs')).status).toBe(401);
  });

  it('password reset by mail: the mailed link sets a new password', async () => {
    const c = new Client(s.url);
    await c.signUp('Resa', 'resa@example.test', 'old-password-11');
    const r = await new Client(s.url).post('/api/auth/request-password-reset', { email: 'resa@example.test', redirectTo: '/reset-password' });
    expect(r.status).toBe(200);
    const mail = await waitForMail(s.url, 'resa@example.test', 'Reset');
    const link = linkIn(mail.text);
    const follow = await fetch(link, { redirect: 'manual' });
    const location = follow.headers.get('location') ?? '';
    const token = new URL(location, s.url).searchParams.get('token');
    expect(token).toBeTruthy();
    const reset = await new Client(s.url).post('/api/auth/reset-password', { token, newPassword: 'new-password-22' });
    expect(reset.status).toBe(200);
    await new Client(s.url).signIn('resa@example.test', 'new-password-22');
    const old = await new Client(s.url).post('/api/auth/sign-in/email', { email: 'resa@example.test', password: 'old-password-11' });
    expect(old.status).toBe(401);
  });

  it('PATCH /api/v1/me stores the unit preference and names a bad field', async () => {
    const c = new Client(s.url);
    await c.signUp('Una', 'una@example.test');
    const ok = await c.patch('/api/v1/me', { unitSystem: 'imperial' });
    expect(ok.status).toBe(200);
    expect((await ok.json()).user.unitSystem).toBe('imperial');
    const bad = await c.patch('/api/v1/me', { unitSystem: 'cubits' });
    expect(bad.status).toBe(400);
    const body = await bad.json();
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.issues[0].path).toBe('unitSystem');
    expect((await (await c.get('/api/v1/me')).json()).user.unitSystem).toBe('imperial');
  });

  it('the demo accounts are seeded and sign in', async () => {
    const { demoAccounts } = await import('../../scripts/seed-demo');
    const c = new Client(s.url);
    await c.signIn(demoAccounts.member.email, demoAccounts.member.password);
    const list = await (await c.get('/api/v1/designs')).json();
    expect(list.designs.length).toBeGreaterThanOrEqual(3);
    const a = new Client(s.url);
    await a.signIn(demoAccounts.admin.email, demoAccounts.admin.password);
    expect((await (await a.get('/api/v1/me')).json()).user.role).toBe('admin');
  });

  it('the home page names Coilwright and loads nothing from another origin', async () => {
    const html = await (await fetch(`${s.url}/`)).text();
    expect(html).toContain('Coilwright');
    const external = [...html.matchAll(/(?:src|href)="(https?:\/\/[^"]+)"/g)].map((m) => m[1]).filter((u) => !u.startsWith(s.url));
    expect(external).toEqual([]);
  });

  it('a cookie-bearing auth request from an untrusted origin is refused; both loopback names are trusted', async () => {
    const port = new URL(s.url).port;
    const evil = await fetch(`${s.url}/api/auth/sign-up/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://evil.example', cookie: 'better-auth.session_token=stale' },
      body: JSON.stringify({ name: 'Eve', email: 'eve@example.test', password: 'long-enough-1' }),
    });
    expect(evil.status).toBe(403);
    for (const [i, origin] of [`http://localhost:${port}`, `http://127.0.0.1:${port}`].entries()) {
      const r = await fetch(`${s.url}/api/auth/sign-up/email`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', origin, cookie: 'better-auth.session_token=stale' },
        body: JSON.stringify({ name: 'Lo', email: `lo-${i}@example.test`, password: 'long-enough-1' }),
      });
      expect(r.status).toBe(200);
    }
  });

  it('/dev/mail.json lists caught mail to loopback callers', async () => {
    const r = await fetch(`${s.url}/dev/mail.json`);
    expect(r.status).toBe(200);
    const list = await r.json();
    expect(Array.isArray(list)).toBe(true);
    for (const m of list) expect(Object.keys(m).sort()).toEqual(['date', 'html', 'subject', 'text', 'to']);
  });
});
