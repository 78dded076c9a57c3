import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { demoAccounts } from '../../scripts/seed-demo';
import { createDesign, signUp } from '../helpers/accounts';
import { addMember, verifiedUser, sphereCoil, toroidCoil } from './designs-fixtures';

/**
 * Every designs route, called by each kind of person: the owner, an editor, a viewer, a site admin, a signed-in
 * stranger and an anonymous caller. A stranger must learn nothing: 404 and no trace of the design's name.
 */

const NAME = 'Quillon Ridge resonator 7731';
type Who = 'owner' | 'editor' | 'viewer' | 'admin' | 'stranger' | 'anonymous';
const everyone: Who[] = ['owner', 'editor', 'viewer', 'admin', 'stranger', 'anonymous'];

let s: TestServer;
let c: Record<Who, Client>;
let ids: Record<'owner' | 'editor' | 'viewer' | 'stranger', string>;
let designId: string;

beforeAll(async () => {
  s = await startServer();
  const owner = await verifiedUser(s.url, 'Owner Ode');
  const editor = await signUp(s.url, 'Editor Eda');
  const viewer = await signUp(s.url, 'Viewer Vik');
  const stranger = await signUp(s.url, 'Stranger Sten');
  const admin = new Client(s.url);
  await admin.signIn(demoAccounts.admin.email, demoAccounts.admin.password);
  c = { owner: owner.c, editor: editor.c, viewer: viewer.c, admin, stranger: stranger.c, anonymous: new Client(s.url) };
  ids = { owner: owner.id, editor: editor.id, viewer: viewer.id, stranger: stranger.id };
  designId = (await createDesign(owner.c, NAME)).id;
  await addMember(s.url, owner.c, designId, editor, 'editor');
  await addMember(s.url, owner.c, designId, viewer, 'viewer');
});
afterAll(async () => {
  await s?.stop();
});

async function latest(id = designId) {
  return (await (await c.owner.get(`/api/v1/designs/${id}`)).json()) as { revision: number; name: string; design: unknown };
}

/** Calls one route as each person; returns the statuses and checks that no refused caller saw the name. */
async function matrix(call: (who: Who) => Promise<Response>) {
  const got: Partial<Record<Who, number>> = {};
  for (const who of everyone) {
    const r = await call(who);
    got[who] = r.status;
    const text = await r.text();
    if (r.status === 404 || r.status === 401) {
      expect(text, `${who} got ${r.status} with the name in it`).not.toContain(NAME);
      if (text) expect(JSON.parse(text).error.code).toBe(r.status === 404 ? 'not_found' : 'unauthorized');
    }
  }
  return got;
}

const readable = { owner: 200, editor: 200, viewer: 200, admin: 200, stranger: 404, anonymous: 401 };
const ownerOnly = (ok: number) => ({ owner: ok, editor: 403, viewer: 403, admin: 403, stranger: 404, anonymous: 401 });

describe('designs routes by role', () => {
  it('GET /api/v1/designs/:id answers each role with its own role name, a stranger 404', async () => {
    expect(await matrix((w) => c[w].get(`/api/v1/designs/${designId}`))).toEqual(readable);
    const roles: Record<string, string> = {};
    for (const w of ['owner', 'editor', 'viewer', 'admin'] as const) roles[w] = (await (await c[w].get(`/api/v1/designs/${designId}`)).json()).role;
    expect(roles).toEqual({ owner: 'owner', editor: 'editor', viewer: 'viewer', admin: 'admin' });
  });

  it('GET /api/v1/designs lists the design for members with their role, not for the stranger', async () => {
    const roleIn = async (w: Who) => {
      const list = (await (await c[w].get('/api/v1/designs')).json()) as { designs: Array<{ id: string; role: string; loadedFrequency: number | null; tapTurns: number | null }> };
      return list.designs.find((d) => d.id === designId);
    };
    expect((await roleIn('owner'))?.role).toBe('owner');
    expect((await roleIn('editor'))?.role).toBe('editor');
    expect((await roleIn('viewer'))?.role).toBe('viewer');
    expect(await roleIn('stranger')).toBeUndefined();
    const row = await roleIn('owner');
    expect(row?.loadedFrequency).toBeGreaterThan(50e3);
    expect(row?.loadedFrequency).toBeLessThan(2e6);
    expect(typeof row?.tapTurns).toBe('number');
  });

  it('GET revisions, one revision, compare, summary, export and members: readable by every role, 404 for a stranger', async () => {
    const routes = [
      `/api/v1/designs/${designId}/revisions`,
      `/api/v1/designs/${designId}/revisions/1`,
      `/api/v1/designs/${designId}/compare?from=1&to=1`,
      `/api/v1/designs/${designId}/summary?format=text`,
      `/api/v1/designs/${designId}/summary?format=markdown`,
      `/api/v1/designs/${designId}/export`,
      `/api/v1/designs/${designId}/members`,
    ];
    for (const path of routes) expect({ path, ...(await matrix((w) => c[w].get(path))) }).toEqual({ path, ...readable });
  });

  it('PUT /api/v1/designs/:id: owner and editor save; viewer and admin get 403 and the design is unchanged', async () => {
    const got: Partial<Record<Who, number>> = {};
    for (const w of everyone) {
      const before = await latest();
      const r = await c[w].put(`/api/v1/designs/${designId}`, { name: NAME, design: w === 'owner' || w === 'editor' ? toroidCoil : sphereCoil, revision: before.revision, message: `by ${w}` });
      got[w] = r.status;
      const text = await r.text();
      if (r.status >= 400) {
        expect(text).not.toContain('"design"');
        const after = await latest();
        expect(after.revision).toBe(before.revision);
        expect(after.design).toEqual(before.design);
      }
      if (w === 'stranger' || w === 'anonymous') expect(text).not.toContain(NAME);
    }
    expect(got).toEqual({ owner: 200, editor: 200, viewer: 403, admin: 403, stranger: 404, anonymous: 401 });
    const revs = (await (await c.owner.get(`/api/v1/designs/${designId}/revisions`)).json()).revisions as Array<{ author: string; message: string }>;
    expect(revs.slice(0, 2).map((r) => r.author)).toEqual(['Editor Eda', 'Owner Ode']);
  });

  it('POST /api/v1/designs/:id/revisions/:n/restore needs write: viewer and admin 403 with nothing saved', async () => {
    const got: Partial<Record<Who, number>> = {};
    for (const w of everyone) {
      const before = await latest();
      const r = await c[w].post(`/api/v1/designs/${designId}/revisions/1/restore`, { revision: before.revision });
      got[w] = r.status;
      if (r.status >= 400) expect((await latest()).revision).toBe(before.revision);
      if (w === 'stranger' || w === 'anonymous') expect(await r.text()).not.toContain(NAME);
    }
    expect(got).toEqual({ owner: 201, editor: 201, viewer: 403, admin: 403, stranger: 404, anonymous: 401 });
  });

  it('POST /api/v1/designs/:id/duplicate: anyone who can read gets their own copy; a stranger 404', async () => {
    const got = await matrix((w) => c[w].post(`/api/v1/designs/${designId}/duplicate`));
    expect(got).toEqual({ owner: 201, editor: 201, viewer: 201, admin: 201, stranger: 404, anonymous: 401 });
    const viewerList = (await (await c.viewer.get('/api/v1/designs')).json()).designs as Array<{ name: string; role: string; revision: number }>;
    const copy = viewerList.find((d) => d.name === `${NAME} (copy)`);
    expect(copy).toMatchObject({ role: 'owner', revision: 1 });
  });

  it('share links: create, list and revoke are the owner’s; others 403, a stranger 404', async () => {
    expect(await matrix((w) => c[w].post(`/api/v1/designs/${designId}/share`))).toEqual(ownerOnly(201));
    expect(await matrix((w) => c[w].get(`/api/v1/designs/${designId}/share`))).toEqual(ownerOnly(200));
    const tokens: string[] = [];
    for (let i = 0; i < 6; i++) tokens.push((await (await c.owner.post(`/api/v1/designs/${designId}/share`)).json()).token);
    const got: Partial<Record<Who, number>> = {};
    for (const [i, w] of everyone.entries()) got[w] = (await c[w].del(`/api/v1/designs/${designId}/share/${tokens[i]}`)).status;
    expect(got).toEqual(ownerOnly(204));
    const live = (await (await c.owner.get(`/api/v1/designs/${designId}/share`)).json()).shares.map((x: { token: string }) => x.token);
    expect(live).not.toContain(tokens[0]);
    expect(live).toEqual(expect.arrayContaining(tokens.slice(1)));
  });

  it('POST /api/v1/designs/:id/invitations and GET the open list are the owner’s; others 403, a stranger 404', async () => {
    expect(await matrix((w) => c[w].post(`/api/v1/designs/${designId}/invitations`, { email: `invitee-${w}@example.test`, role: 'viewer' }))).toEqual(ownerOnly(201));
    expect(await matrix((w) => c[w].get(`/api/v1/designs/${designId}/invitations`))).toEqual(ownerOnly(200));
    const open = (await (await c.owner.get(`/api/v1/designs/${designId}/invitations`)).json()).invitations.map((i: { email: string }) => i.email);
    expect(open).toEqual(['invitee-owner@example.test']);
  });

  it('PATCH and DELETE /api/v1/designs/:id/members/:userId are the owner’s; others 403, a stranger 404', async () => {
    const patch = await matrix((w) => c[w].patch(`/api/v1/designs/${designId}/members/${ids.viewer}`, { role: 'viewer' }));
    expect(patch).toEqual(ownerOnly(200));
    // The editor may not remove the viewer; only the owner may remove others.
    expect((await c.editor.del(`/api/v1/designs/${designId}/members/${ids.viewer}`)).status).toBe(403);
    expect((await c.admin.del(`/api/v1/designs/${designId}/members/${ids.viewer}`)).status).toBe(403);
    expect((await c.stranger.del(`/api/v1/designs/${designId}/members/${ids.viewer}`)).status).toBe(404);
    expect((await c.anonymous.del(`/api/v1/designs/${designId}/members/${ids.viewer}`)).status).toBe(401);
    const members = (await (await c.owner.get(`/api/v1/designs/${designId}/members`)).json()).members as Array<{ userId: string; role: string }>;
    expect(members.map((m) => m.role)).toEqual(['owner', 'editor', 'viewer']);
  });

  it('POST /api/v1/designs/:id/transfer is the owner’s; others 403, a stranger 404, and nothing changes', async () => {
    for (const w of ['editor', 'viewer', 'admin', 'stranger', 'anonymous'] as const) {
      const r = await c[w].post(`/api/v1/designs/${designId}/transfer`, { userId: ids.editor });
      expect({ w, status: r.status }).toEqual({ w, status: { editor: 403, viewer: 403, admin: 403, stranger: 404, anonymous: 401 }[w] });
    }
    expect((await (await c.owner.get(`/api/v1/designs/${designId}`)).json()).role).toBe('owner');
  });

  it('pages history, people, one revision and compare: 200 for members and admin, 404 for a stranger, sign-in for anonymous', async () => {
    for (const path of [`/designs/${designId}/history`, `/designs/${designId}/people`, `/designs/${designId}/revisions/1`, `/designs/${designId}/compare?from=1&to=2`]) {
      const got: Partial<Record<Who, number>> = {};
      for (const w of everyone) {
        const r = await c[w].get(path);
        got[w] = r.status;
        const html = await r.text();
        if (w === 'stranger' || w === 'anonymous') expect(html, `${w} on ${path}`).not.toContain(NAME);
        else expect(html).toContain(NAME);
      }
      expect({ path, ...got }).toEqual({ path, owner: 200, editor: 200, viewer: 200, admin: 200, stranger: 404, anonymous: 302 });
    }
  });

  it('DELETE /api/v1/designs/:id is the owner’s; others 403, a stranger 404, and the design stays until the owner deletes it', async () => {
    for (const w of ['editor', 'viewer', 'admin', 'stranger', 'anonymous'] as const) {
      const r = await c[w].del(`/api/v1/designs/${designId}`);
      expect({ w, status: r.status }).toEqual({ w, status: { editor: 403, viewer: 403, admin: 403, stranger: 404, anonymous: 401 }[w] });
      expect((await c.owner.get(`/api/v1/designs/${designId}`)).status).toBe(200);
    }
    expect((await c.owner.del(`/api/v1/designs/${designId}`)).status).toBe(204);
    expect((await c.owner.get(`/api/v1/designs/${designId}`)).status).toBe(404);
    expect((await c.editor.get(`/api/v1/designs/${designId}`)).status).toBe(404);
    expect((await c.admin.get(`/api/v1/designs/${designId}`)).status).toBe(404);
  });

  it('an unknown design id is 404 for everyone signed in, admins included', async () => {
    for (const w of ['owner', 'admin', 'stranger'] as const) expect((await c[w].get('/api/v1/designs/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});
