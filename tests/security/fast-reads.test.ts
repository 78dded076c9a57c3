import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createClient } from '@libsql/client';
import { join } from 'node:path';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { addMember, toroidCoil, verifiedUser } from '../api/designs-fixtures';

// The front server answers repeat reads of a design (the API read and the design page) itself once the app
// has verified the session. These are the app's own guarantees, checked on the third and later request of
// a session, which is the one the front server answers.
let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

const paths = (id: string) => [`/api/v1/designs/${id}`, `/designs/${id}`];
const refused = (status: number) => status === 401 || status === 302 || status === 303 || status === 404;

async function warm(c: Client, id: string) {
  for (const p of paths(id)) for (let i = 0; i < 3; i++) expect((await c.get(p)).status, p).toBe(200);
}

/** Milliseconds until every path refuses the client, or Infinity after limitMs. */
async function untilRefused(c: Client, id: string, limitMs: number): Promise<number> {
  const t0 = Date.now();
  for (;;) {
    const statuses = await Promise.all(paths(id).map(async (p) => (await c.get(p)).status));
    if (statuses.every(refused)) return Date.now() - t0;
    for (const st of statuses) expect([200, 401, 302, 303, 404]).toContain(st);
    if (Date.now() - t0 > limitMs) return Infinity;
    await new Promise((ok) => setTimeout(ok, 200));
  }
}

describe('repeat reads of a design', () => {
  it('carry the same status, body and header names as the app’s own answer', async () => {
    const { c } = await signUp(s.url, 'Fast Fay');
    const { id } = await createDesign(c, 'Jetty coil', toroidCoil);
    for (const p of paths(id)) {
      const answers = [];
      for (let i = 0; i < 4; i++) {
        const r = await fetch(s.url + p, { headers: { cookie: [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; '), 'accept-encoding': 'identity' } });
        answers.push({ status: r.status, body: await r.text(), headers: [...r.headers.keys()].filter((k) => k !== 'date').sort().join(',') });
      }
      for (const a of answers.slice(1)) expect(a).toEqual(answers[0]);
      expect(answers[0].headers).toContain('content-security-policy');
      expect(answers[0].headers).toContain('x-frame-options');
    }
  });

  it('stop at once for a member removed from the design, and for a stranger never start', async () => {
    const owner = await verifiedUser(s.url, 'Owner Odo');
    const member = await verifiedUser(s.url, 'Member Mae');
    const { id } = await createDesign(owner.c, 'Breakwater coil', toroidCoil);
    await addMember(s.url, owner.c, id, member, 'viewer');
    await warm(member.c, id);
    const members = (await (await owner.c.get(`/api/v1/designs/${id}/members`)).json()) as { members: Array<{ userId: string }> };
    expect(members.members.some((m) => m.userId === member.id)).toBe(true);
    expect((await owner.c.del(`/api/v1/designs/${id}/members/${member.id}`)).status).toBe(204);
    expect((await member.c.get(`/api/v1/designs/${id}`)).status).toBe(404);
    expect((await member.c.get(`/designs/${id}`)).status).toBe(404);

    const stranger = (await signUp(s.url, 'Stranger Sol')).c;
    await stranger.get('/api/v1/me');
    for (let i = 0; i < 3; i++) for (const p of paths(id)) expect((await stranger.get(p)).status, p).toBe(404);
  });

  it('stop for a copied cookie once its session is signed out, and for a disabled user, within the cache lifetime', async () => {
    const { c } = await signUp(s.url, 'Copy Cato');
    const { id } = await createDesign(c, 'Slipway coil', toroidCoil);
    const copy = new Client(s.url);
    copy.cookies = new Map(c.cookies);
    await warm(copy, id);
    expect((await c.post('/api/auth/sign-out', {})).status).toBe(200);
    expect(await untilRefused(copy, id, 6000)).toBeLessThan(6000);

    const target = await signUp(s.url, 'Disabled Dov');
    const mine = await createDesign(target.c, 'Pier coil', toroidCoil);
    await warm(target.c, mine.id);
    const db = createClient({ url: `file:${join(s.dataDir, 'test.db')}` });
    const adminUser = await signUp(s.url, 'Admin Abe');
    await db.execute({ sql: "UPDATE user SET role = 'admin' WHERE id = ?", args: [adminUser.id] });
    db.close();
    const admin = new Client(s.url);
    await admin.signIn(adminUser.email);
    expect((await admin.post('/api/auth/admin/ban-user', { userId: target.id, banReason: 'left the club' })).status).toBe(200);
    expect(await untilRefused(target.c, mine.id, 6000)).toBeLessThan(6000);
  });
});
