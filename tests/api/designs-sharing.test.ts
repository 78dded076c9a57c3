import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { toroidCoil } from './designs-fixtures';

const NAME = 'Marrowby bench coil 4410';
let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

async function sharedDesign() {
  const owner = await signUp(s.url, 'Sharer Sol');
  const { id } = await createDesign(owner.c, NAME);
  const r = await owner.c.post(`/api/v1/designs/${id}/share`);
  expect(r.status).toBe(201);
  const share = (await r.json()) as { token: string; url: string };
  return { owner, id, ...share };
}

describe('share links', () => {
  it('POST /api/v1/designs/:id/share returns a token of at least 128 bits and a /s/ url', async () => {
    const { token, url } = await sharedDesign();
    expect(token).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(token.length * 6).toBeGreaterThanOrEqual(128);
    expect(url).toBe(`${s.url}/s/${token}`);
  });

  it('GET /api/v1/shared/:token reads the design and its result without sign-in', async () => {
    const { token } = await sharedDesign();
    const r = await fetch(`${s.url}/api/v1/shared/${token}`);
    expect(r.status).toBe(200);
    const body = await r.json();
    expect(body.name).toBe(NAME);
    expect(body.design).toEqual(toroidCoil);
    expect(body.result.system.resonantFrequency).toBeGreaterThan(50e3);
  });

  it('a share link is read-only: no write route accepts the token', async () => {
    const { token, id, owner } = await sharedDesign();
    const anon = new Client(s.url);
    const attempts = [
      await anon.put(`/api/v1/shared/${token}`, { name: 'Hijacked', design: toroidCoil, revision: 1 }),
      await anon.del(`/api/v1/shared/${token}`),
      await anon.put(`/api/v1/designs/${id}?token=${token}`, { name: 'Hijacked', design: toroidCoil, revision: 1 }),
      await anon.req('PUT', `/api/v1/designs/${id}`, { name: 'Hijacked', design: toroidCoil, revision: 1 }, { authorization: `Bearer ${token}` }),
    ];
    for (const r of attempts) expect(r.status === 401 || r.status === 404 || r.status === 405).toBe(true);
    const now = await (await owner.c.get(`/api/v1/designs/${id}`)).json();
    expect(now).toMatchObject({ name: NAME, revision: 1 });
  });

  it('a share link keeps working after the owner signs out, and dies when revoked', async () => {
    const { token, id, owner } = await sharedDesign();
    expect((await owner.c.post('/api/auth/sign-out', {})).status).toBe(200);
    expect((await fetch(`${s.url}/api/v1/shared/${token}`)).status).toBe(200);
    expect((await fetch(`${s.url}/s/${token}`)).status).toBe(200);
    await owner.c.signIn(owner.email);
    expect((await owner.c.del(`/api/v1/designs/${id}/share/${token}`)).status).toBe(204);
    const gone = await fetch(`${s.url}/api/v1/shared/${token}`);
    expect(gone.status).toBe(404);
    const text = await gone.text();
    expect(JSON.parse(text).error.code).toBe('not_found');
    expect(text).not.toContain(NAME);
    const page = await fetch(`${s.url}/s/${token}`);
    expect(page.status).toBe(404);
    expect(await page.text()).not.toContain(NAME);
    expect((await owner.c.del(`/api/v1/designs/${id}/share/${token}`)).status).toBe(404);
    const listed = (await (await owner.c.get(`/api/v1/designs/${id}/share`)).json()).shares;
    expect(listed).toEqual([]);
  });

  it('a tampered or unknown token is 404 on the API and the page, with no design data', async () => {
    const { token } = await sharedDesign();
    const flipped = token.slice(0, -1) + (token.endsWith('A') ? 'B' : 'A');
    for (const t of [flipped, token.slice(0, -4), `${token}x`, 'nope', "%27%20or%201%3D1--"]) {
      const api = await fetch(`${s.url}/api/v1/shared/${t}`);
      expect({ t, status: api.status }).toEqual({ t, status: 404 });
      expect(await api.text()).not.toContain(NAME);
      const page = await fetch(`${s.url}/s/${t}`);
      expect({ t, status: page.status }).toEqual({ t, status: 404 });
      expect(await page.text()).not.toContain(NAME);
    }
  });

  it('GET /s/:token shows the name and the loaded frequency without sign-in', async () => {
    const { token } = await sharedDesign();
    const r = await fetch(`${s.url}/s/${token}`);
    expect(r.status).toBe(200);
    const html = await r.text();
    expect(html).toContain(NAME);
    expect(html).toMatch(/kHz/);
  });

  it('POST /api/v1/shared/:token/copy makes a new design at revision 1 owned by the signed-in visitor', async () => {
    const { token, owner, id } = await sharedDesign();
    expect((await new Client(s.url).post(`/api/v1/shared/${token}/copy`)).status).toBe(401);
    const visitor = await signUp(s.url, 'Visitor Vera');
    const r = await visitor.c.post(`/api/v1/shared/${token}/copy`);
    expect(r.status).toBe(201);
    const copy = await r.json();
    expect(copy).toMatchObject({ revision: 1, role: 'owner', name: `${NAME} (copy)`, design: toroidCoil });
    expect(copy.id).not.toBe(id);
    const mine = (await (await visitor.c.get('/api/v1/designs')).json()).designs;
    expect(mine.map((d: { id: string }) => d.id)).toEqual([copy.id]);
    // The copy is the visitor's own: editing it leaves the original alone.
    const renamed = await visitor.c.put(`/api/v1/designs/${copy.id}`, { name: 'Mine now', design: toroidCoil, revision: 1 });
    expect(renamed.status).toBe(200);
    expect((await (await owner.c.get(`/api/v1/designs/${id}`)).json()).name).toBe(NAME);
    // The visitor gains no role on the original.
    expect((await visitor.c.get(`/api/v1/designs/${id}`)).status).toBe(404);
    const named = await visitor.c.post(`/api/v1/shared/${token}/copy`, { name: 'Second copy' });
    expect((await named.json()).name).toBe('Second copy');
  });

  it('POST /api/v1/shared/:token/copy with a revoked token is 404 and creates nothing', async () => {
    const { token, owner, id } = await sharedDesign();
    await owner.c.del(`/api/v1/designs/${id}/share/${token}`);
    const visitor = await signUp(s.url, 'Late Lars');
    expect((await visitor.c.post(`/api/v1/shared/${token}/copy`)).status).toBe(404);
    expect((await (await visitor.c.get('/api/v1/designs')).json()).designs).toEqual([]);
  });
});

describe('review summary', () => {
  it('GET /api/v1/designs/:id/summary?format=text lists inputs as given and key results with units', async () => {
    const owner = await signUp(s.url, 'Summary Sam');
    const { id } = await createDesign(owner.c, NAME);
    const r = await owner.c.get(`/api/v1/designs/${id}/summary?format=text`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/^text\/plain/);
    const text = await r.text();
    const lines = text.split('\n');
    // one header line with the key figures, then one table grouped as the results panel is
    expect(lines[0]).toContain(NAME);
    expect(lines[0]).toMatch(/tap [\d.]+ turns · loaded resonant frequency [\d.]+ kHz · coupling k 0\.\d+ · tank energy at the supply peak [\d.]+ J/);
    expect(lines[2]).toBe('| Group | Figure | Value |');
    expect(text).toMatch(/\| Decides the build \| Primary tap \(turns from the inner end\) \| [\d.]+ turns \|/);
    expect(text).toMatch(/\| What to buy \| Secondary wire length \| [\d.]+ (m|ft) \|/);
    expect(text).toMatch(/\| Input: Secondary \| Form outer diameter \| 4\.5 in \|/);
    expect(text).toMatch(/\| {2}\| Secondary turns \| 1000 \|/);
    // no capital-letter section headings over aligned columns
    expect(text).not.toMatch(/^[A-Z ()]{6,}$/m);
    expect(text).toMatch(/can kill/);
    expect(text).not.toMatch(/NaN|Infinity|undefined|\[object/);
  });

  it('GET /api/v1/designs/:id/summary?format=markdown gives Markdown tables; a bad format is 400 naming the field', async () => {
    const owner = await signUp(s.url, 'Summary Sue');
    const { id } = await createDesign(owner.c, NAME);
    const r = await owner.c.get(`/api/v1/designs/${id}/summary?format=markdown`);
    expect(r.headers.get('content-type')).toMatch(/^text\/markdown/);
    const md = await r.text();
    expect(md.split('\n')[0]).toMatch(new RegExp(`^\\*\\*${NAME}`));
    expect(md).toMatch(/\| {2}\| Secondary turns \| 1000 \|/);
    expect(md).toMatch(/\| Loaded resonant frequency \(with topload\) \| [\d.]+ kHz \|/);
    const bad = await owner.c.get(`/api/v1/designs/${id}/summary?format=pdf`);
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('format');
  });

  it('GET /api/v1/shared/:token/summary works without sign-in and links the shared page', async () => {
    const { token } = await sharedDesign();
    const r = await fetch(`${s.url}/api/v1/shared/${token}/summary?format=markdown`);
    expect(r.status).toBe(200);
    const md = await r.text();
    expect(md).toContain(NAME);
    expect(md).toContain(`/s/${token}`);
    expect((await fetch(`${s.url}/api/v1/shared/${token}x/summary`)).status).toBe(404);
  });
});
