import { describe, expect, it } from 'vitest';
import { openDb, prepareDb } from '../../src/server/db/client';
import { createAuth } from '../../src/server/auth';
import type { OutgoingMail } from '../../src/server/mail';

async function setup(signInLimit = 3) {
  const db = openDb(':memory:');
  await prepareDb(db, ':memory:');
  const sent: OutgoingMail[] = [];
  const auth = createAuth({
    db,
    baseURL: 'http://127.0.0.1:4321',
    secret: 'test-secret-test-secret-test-secret-000',
    trustedOrigins: ['http://127.0.0.1:4321'],
    send: async (m) => void sent.push(m),
    signInLimit,
  });
  return { db, auth, sent };
}

function post(path: string, body: unknown, ip: string, origin?: string) {
  return new Request(`http://127.0.0.1:4321/api/auth${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-coilwright-client-ip': ip, ...(origin ? { origin } : {}) },
    body: JSON.stringify(body),
  });
}

describe('createAuth (better-auth on an in-memory database)', () => {
  it('new accounts get the member role and an unverified address', async () => {
    const { auth, db } = await setup();
    const r = await auth.handler(post('/sign-up/email', { name: 'Pia', email: 'pia@example.test', password: 'long-enough-1' }, '10.0.0.1'));
    expect(r.status).toBe(200);
    const u = await db.query.user.findFirst();
    expect(u?.role).toBe('member');
    expect(u?.emailVerified).toBe(false);
    expect(u?.unitSystem).toBe('metric');
  });

  it('rate-limits repeated sign-in attempts per client address, not across addresses', async () => {
    const { auth } = await setup(3);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const r = await auth.handler(post('/sign-in/email', { email: 'nobody@example.test', password: 'wrong-wrong-1' }, '10.0.0.2'));
      statuses.push(r.status);
    }
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    expect(statuses[4]).toBe(429);
    const other = await auth.handler(post('/sign-in/email', { email: 'nobody@example.test', password: 'wrong-wrong-1' }, '10.0.0.3'));
    expect(other.status).toBe(401);
  });
});
