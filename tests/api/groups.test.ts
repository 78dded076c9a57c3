import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createClient } from '@libsql/client';
import { join } from 'node:path';
import { readdirSync } from 'node:fs';
import { startServer, type TestServer } from '../helpers/server';
import { linkIn, waitForMail, type Client } from '../helpers/client';
import { createDesign, signUp, uniqueEmail } from '../helpers/accounts';
import { demoAccounts } from '../../scripts/seed-demo';
import { tokenFromLink, toroidCoil, verifiedUser } from './designs-fixtures';
import { caughtMail, everyone, groupDesign, groupScene, joinGroup, matrix, type Person, type Who } from './groups-fixtures';

/**
 * Every group route, called by a site admin, the group's admin, a supervisor, a member, a signed-in outsider and an
 * anonymous caller; and the existing design routes reached through a group. An outsider learns nothing (404).
 */

const GROUP = 'Wharf Road coil circle 5521';
const DESIGN = 'Wharf Road bench coil 8843';

let s: TestServer;
let c: Record<Who, Client>;
let people: { groupAdmin: Person; supervisor: Person; member: Person; outsider: Person };
let groupId: string;
let designId: string;

beforeAll(async () => {
  s = await startServer();
  ({ c, people, groupId, designId } = await groupScene(s.url, GROUP, DESIGN));
});
afterAll(async () => {
  await s?.stop();
});

const groupRead = { siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 };
const adminOnly = (ok: number) => ({ siteAdmin: 403, groupAdmin: ok, supervisor: 403, member: 403, outsider: 404, anonymous: 401 });

async function groupOf(id = groupId) {
  return (await (await c.groupAdmin.get(`/api/v1/groups/${id}`)).json()) as { name: string; members: Array<{ userId: string; role: string; email: string | null }> };
}

describe('GET and POST /api/v1/groups', () => {
  it('GET /api/v1/groups lists each person’s groups with their role; outsiders and site admins see none of it', async () => {
    expect(await matrix((w) => c[w].get('/api/v1/groups'))).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 200, anonymous: 401 });
    const roleIn = async (w: Who) => ((await (await c[w].get('/api/v1/groups')).json()).groups as Array<{ id: string; name: string; role: string }>).find((g) => g.id === groupId);
    expect(await roleIn('groupAdmin')).toMatchObject({ id: groupId, name: GROUP, role: 'admin', memberCount: 3 });
    expect((await roleIn('supervisor'))?.role).toBe('supervisor');
    expect((await roleIn('member'))?.role).toBe('member');
    expect(await roleIn('outsider')).toBeUndefined();
    expect(await roleIn('siteAdmin')).toBeUndefined();
  });

  it('POST /api/v1/groups makes the caller the admin; a bad name is a 400 naming the field and creates nothing', async () => {
    const made = await matrix((w) => c[w].post('/api/v1/groups', { name: `Own group of ${w}` }));
    expect(made).toEqual({ siteAdmin: 201, groupAdmin: 201, supervisor: 201, member: 201, outsider: 201, anonymous: 401 });
    const before = (await (await c.outsider.get('/api/v1/groups')).json()).groups;
    expect(before).toEqual([expect.objectContaining({ name: 'Own group of outsider', role: 'admin' })]);
    for (const body of [{ name: '' }, { name: 'x'.repeat(121) }, {}, { name: 42 }]) {
      const r = await c.outsider.post('/api/v1/groups', body);
      expect(r.status).toBe(400);
      expect((await r.json()).error.issues[0].path).toBe('name');
    }
    expect((await c.outsider.req('POST', '/api/v1/groups', '{not json')).status).toBe(400);
    expect((await (await c.outsider.get('/api/v1/groups')).json()).groups).toEqual(before);
  });
});

describe('/api/v1/groups/:groupId', () => {
  it('GET: members and site admins read it, an outsider gets 404 without the name; addresses only for the admin', async () => {
    expect(await matrix((w) => c[w].get(`/api/v1/groups/${groupId}`), GROUP)).toEqual(groupRead);
    const asMember = await (await c.member.get(`/api/v1/groups/${groupId}`)).json();
    expect(asMember.role).toBe('member');
    expect(asMember.members.map((m: { role: string }) => m.role)).toEqual(['admin', 'supervisor', 'member']);
    expect(asMember.members.filter((m: { email: string | null }) => m.email).map((m: { userId: string }) => m.userId)).toEqual([people.member.id]);
    expect((await (await c.siteAdmin.get(`/api/v1/groups/${groupId}`)).json()).role).toBeNull();
    expect((await groupOf()).members.every((m) => m.email)).toBe(true);
    expect((await c.member.get('/api/v1/groups/00000000-0000-0000-0000-000000000000')).status).toBe(404);
    expect((await c.member.get('/api/v1/groups/not%20an%20id')).status).toBe(404);
  });

  it('PATCH renames for the group admin only; refused calls leave the name as it was', async () => {
    const got = await matrix((w) => c[w].patch(`/api/v1/groups/${groupId}`, { name: w === 'groupAdmin' ? GROUP : `Taken over by ${w}` }), GROUP);
    expect(got).toEqual(adminOnly(200));
    expect((await groupOf()).name).toBe(GROUP);
    const bad = await c.groupAdmin.patch(`/api/v1/groups/${groupId}`, { name: '   ' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('name');
    expect((await groupOf()).name).toBe(GROUP);
  });

  it('DELETE is the group admin’s; the group’s designs stay with their owners, out of any group, and members lose them', async () => {
    const scene = await groupScene(s.url, 'Short-lived circle', 'Short-lived coil');
    const got = await matrix((w) => scene.c[w].del(`/api/v1/groups/${scene.groupId}`), undefined, ['siteAdmin', 'supervisor', 'member', 'outsider', 'anonymous', 'groupAdmin']);
    expect(got).toEqual(adminOnly(204));
    expect((await scene.c.groupAdmin.get(`/api/v1/groups/${scene.groupId}`)).status).toBe(404);
    const d = await (await scene.c.groupAdmin.get(`/api/v1/designs/${scene.designId}`)).json();
    expect(d).toMatchObject({ role: 'owner', groupId: null });
    expect((await scene.c.member.get(`/api/v1/designs/${scene.designId}`)).status).toBe(404);
    expect((await scene.c.supervisor.get(`/api/v1/designs/${scene.designId}`)).status).toBe(404);
  });
});

describe('group invitations', () => {
  it('POST and GET /groups/:groupId/invitations are the admin’s; others are refused and no mail goes out', async () => {
    const targets = Object.fromEntries(everyone.map((w) => [w, uniqueEmail(`invitee-${w.toLowerCase()}`)])) as Record<Who, string>;
    expect(await matrix((w) => c[w].post(`/api/v1/groups/${groupId}/invitations`, { email: targets[w], role: 'member' }), GROUP)).toEqual(adminOnly(201));
    expect(await matrix((w) => c[w].get(`/api/v1/groups/${groupId}/invitations`), GROUP)).toEqual(adminOnly(200));
    await waitForMail(s.url, targets.groupAdmin, 'Invitation to the group');
    const mail = await caughtMail(s.url);
    for (const w of everyone.filter((x) => x !== 'groupAdmin')) expect(mail.some((m) => m.to.includes(targets[w]))).toBe(false);
    const open = (await (await c.groupAdmin.get(`/api/v1/groups/${groupId}/invitations`)).json()).invitations.map((i: { email: string }) => i.email);
    expect(open).toContain(targets.groupAdmin);
    for (const w of everyone.filter((x) => x !== 'groupAdmin')) expect(open).not.toContain(targets[w]);
  });

  it('bad address or role is a 400 naming the field; an unconfirmed admin gets email_not_verified; nothing is stored or sent', async () => {
    const before = (await (await c.groupAdmin.get(`/api/v1/groups/${groupId}/invitations`)).json()).invitations.length;
    const bad = await c.groupAdmin.post(`/api/v1/groups/${groupId}/invitations`, { email: 'not-an-address', role: 'admin' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'role']);
    const already = await c.groupAdmin.post(`/api/v1/groups/${groupId}/invitations`, { email: people.member.email, role: 'supervisor' });
    expect(already.status).toBe(409);
    expect((await (await c.groupAdmin.get(`/api/v1/groups/${groupId}/invitations`)).json()).invitations.length).toBe(before);

    const fresh = await signUp(s.url, 'Unconfirmed Una');
    const g = (await (await fresh.c.post('/api/v1/groups', { name: 'Unconfirmed circle' })).json()).id;
    const to = uniqueEmail('never-sent');
    const r = await fresh.c.post(`/api/v1/groups/${g}/invitations`, { email: to, role: 'member' });
    expect(r.status).toBe(403);
    expect((await r.json()).error.code).toBe('email_not_verified');
    expect((await (await fresh.c.get(`/api/v1/groups/${g}/invitations`)).json()).invitations).toEqual([]);
    expect((await caughtMail(s.url)).some((m) => m.to.includes(to))).toBe(false);
  });

  it('the mailed link: described without sign-in, accepted once by a newcomer, then gone; only a hash is stored', async () => {
    const to = uniqueEmail('newcomer');
    expect((await c.groupAdmin.post(`/api/v1/groups/${groupId}/invitations`, { email: to, role: 'supervisor' })).status).toBe(201);
    const mail = await waitForMail(s.url, to, 'Invitation to the group');
    expect(mail.subject).toContain(GROUP);
    const token = tokenFromLink(linkIn(mail.text), '/group-invitations/');
    const page = await fetch(`${s.url}/group-invitations/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain(GROUP);
    const described = await matrix((w) => c[w].get(`/api/v1/group-invitations/${token}`));
    expect(described).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 200, anonymous: 200 });
    expect(await (await c.anonymous.get(`/api/v1/group-invitations/${token}`)).json()).toMatchObject({ groupName: GROUP, role: 'supervisor', email: to, invitedBy: 'Admin Ada' });
    expect((await c.anonymous.post(`/api/v1/group-invitations/${token}/accept`)).status).toBe(401);
    const newcomer = await signUp(s.url, 'Newcomer Nell', to);
    expect((await newcomer.c.get(`/api/v1/designs/${designId}`)).status).toBe(404);
    const a = await newcomer.c.post(`/api/v1/group-invitations/${token}/accept`);
    expect(a.status).toBe(200);
    expect(await a.json()).toEqual({ groupId, name: GROUP, role: 'supervisor' });
    expect((await (await newcomer.c.get(`/api/v1/designs/${designId}`)).json()).role).toBe('editor');
    // single-use
    expect((await c.anonymous.get(`/api/v1/group-invitations/${token}`)).status).toBe(404);
    expect((await c.outsider.post(`/api/v1/group-invitations/${token}/accept`)).status).toBe(404);
    expect((await c.outsider.get(`/api/v1/designs/${designId}`)).status).toBe(404);
    const db = readdirSync(s.dataDir).filter((f) => f.startsWith('test.db'));
    const { readFileSync } = await import('node:fs');
    for (const f of db) expect(readFileSync(join(s.dataDir, f)).includes(Buffer.from(token))).toBe(false);
    // tidy up: the newcomer leaves again
    expect((await newcomer.c.del(`/api/v1/groups/${groupId}/members/${newcomer.id}`)).status).toBe(204);
  });

  it('POST /group-invitations/:token/accept: only the invited address joins, with the invited role; people already in the group cannot be invited again', async () => {
    const scene = await groupScene(s.url, 'Accept matrix circle', 'Accept matrix coil');
    const invite = (to: string) => scene.c.groupAdmin.post(`/api/v1/groups/${scene.groupId}/invitations`, { email: to, role: 'supervisor' });
    for (const w of ['groupAdmin', 'supervisor', 'member'] as const) expect({ w, status: (await invite(scene.people[w].email)).status }).toEqual({ w, status: 409 });
    const tokenFor = async (to: string) => {
      expect((await invite(to)).status).toBe(201);
      return tokenFromLink(linkIn((await waitForMail(s.url, to, 'Invitation to the group')).text), '/group-invitations/');
    };
    const forOutsider = await tokenFor(scene.people.outsider.email);
    const forAdmin = await tokenFor(demoAccounts.admin.email);
    const forNobody = await tokenFor(uniqueEmail('accept-anonymous'));
    // A link used by anyone but the invited address is refused and stays usable.
    for (const w of ['siteAdmin', 'supervisor', 'member'] as const) {
      expect({ w, status: (await scene.c[w].post(`/api/v1/group-invitations/${forOutsider}/accept`)).status }).toEqual({ w, status: 403 });
    }
    expect((await scene.c.groupAdmin.post(`/api/v1/group-invitations/${forOutsider}/accept`)).status).toBe(409);
    expect((await scene.c.anonymous.post(`/api/v1/group-invitations/${forNobody}/accept`)).status).toBe(401);
    expect((await scene.c.anonymous.get(`/api/v1/group-invitations/${forOutsider}`)).status).toBe(200);
    expect((await scene.c.outsider.post(`/api/v1/group-invitations/${forOutsider}/accept`)).status).toBe(200);
    expect((await scene.c.siteAdmin.post(`/api/v1/group-invitations/${forAdmin}/accept`)).status).toBe(200);
    const roles = Object.fromEntries((await (await scene.c.groupAdmin.get(`/api/v1/groups/${scene.groupId}`)).json()).members.map((m: { userId: string; role: string }) => [m.userId, m.role]));
    expect(roles[scene.people.groupAdmin.id]).toBe('admin');
    expect(roles[scene.people.member.id]).toBe('member');
    expect(roles[scene.people.outsider.id]).toBe('supervisor');
    // used links are spent; the refused ones were not
    expect((await scene.c.anonymous.get(`/api/v1/group-invitations/${forOutsider}`)).status).toBe(404);
    expect((await scene.c.anonymous.get(`/api/v1/group-invitations/${forNobody}`)).status).toBe(200);
  });

  it('an invitation older than two weeks no longer works; unknown tokens are 404', async () => {
    const to = uniqueEmail('late');
    await c.groupAdmin.post(`/api/v1/groups/${groupId}/invitations`, { email: to, role: 'member' });
    const token = tokenFromLink(linkIn((await waitForMail(s.url, to, 'Invitation to the group')).text), '/group-invitations/');
    const raw = createClient({ url: `file:${join(s.dataDir, 'test.db')}` });
    await raw.execute({ sql: 'update group_invitations set created_at = created_at - ? where email = ?', args: [15 * 24 * 3600 * 1000, to] });
    raw.close();
    const late = await signUp(s.url, 'Late Lou', to);
    expect((await late.c.post(`/api/v1/group-invitations/${token}/accept`)).status).toBe(404);
    expect((await late.c.get('/api/v1/groups')).status).toBe(200);
    expect((await (await late.c.get('/api/v1/groups')).json()).groups).toEqual([]);
    const listed = (await (await c.groupAdmin.get(`/api/v1/groups/${groupId}/invitations`)).json()).invitations.find((i: { email: string }) => i.email === to);
    expect(listed.expired).toBe(true);
    expect((await c.anonymous.get('/api/v1/group-invitations/short')).status).toBe(404);
    expect((await c.anonymous.get('/api/v1/group-invitations/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA')).status).toBe(404);
  });

  it('DELETE /groups/:groupId/invitations/:id withdraws for the admin only', async () => {
    const ids: string[] = [];
    for (const w of everyone) ids.push((await (await c.groupAdmin.post(`/api/v1/groups/${groupId}/invitations`, { email: uniqueEmail(`withdraw-${w.toLowerCase()}`), role: 'member' })).json()).id);
    const got: Partial<Record<Who, number>> = {};
    for (const [i, w] of everyone.entries()) got[w] = (await c[w].del(`/api/v1/groups/${groupId}/invitations/${ids[i]}`)).status;
    expect(got).toEqual(adminOnly(204));
    const open = (await (await c.groupAdmin.get(`/api/v1/groups/${groupId}/invitations`)).json()).invitations.map((i: { id: string }) => i.id);
    expect(open).not.toContain(ids[1]);
    expect(open).toEqual(expect.arrayContaining(ids.filter((_, i) => i !== 1)));
  });
});

describe('members, roles, leaving and transfer', () => {
  it('PATCH /groups/:groupId/members/:userId sets member or supervisor, for the admin only; the admin’s own role cannot be set', async () => {
    expect(await matrix((w) => c[w].patch(`/api/v1/groups/${groupId}/members/${people.member.id}`, { role: 'member' }), GROUP)).toEqual(adminOnly(200));
    const bad = await c.groupAdmin.patch(`/api/v1/groups/${groupId}/members/${people.member.id}`, { role: 'admin' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('role');
    expect((await c.groupAdmin.patch(`/api/v1/groups/${groupId}/members/${people.groupAdmin.id}`, { role: 'member' })).status).toBe(400);
    expect((await c.groupAdmin.patch(`/api/v1/groups/${groupId}/members/${people.outsider.id}`, { role: 'member' })).status).toBe(404);
    expect((await groupOf()).members.map((m) => m.role)).toEqual(['admin', 'supervisor', 'member']);
  });

  it('DELETE /groups/:groupId/members/:userId removes for the admin; others may not remove someone else', async () => {
    const scene = await groupScene(s.url, 'Removal circle', 'Removal coil');
    const spare = await signUp(s.url, 'Spare Sam');
    await joinGroup(s.url, scene.c.groupAdmin, scene.groupId, spare, 'member');
    const got = await matrix((w) => scene.c[w].del(`/api/v1/groups/${scene.groupId}/members/${spare.id}`), undefined, ['siteAdmin', 'supervisor', 'member', 'outsider', 'anonymous', 'groupAdmin']);
    expect(got).toEqual(adminOnly(204));
    expect((await spare.c.get(`/api/v1/groups/${scene.groupId}`)).status).toBe(404);
    const left = await scene.c.groupAdmin.del(`/api/v1/groups/${scene.groupId}/members/${scene.people.groupAdmin.id}`);
    expect(left.status).toBe(400);
    expect((await (await scene.c.groupAdmin.get(`/api/v1/groups/${scene.groupId}`)).json()).members).toHaveLength(3);
  });

  it('a member removed from the group loses the group’s designs at once, on every route', async () => {
    const scene = await groupScene(s.url, 'Revocation circle', 'Revocation coil 6102');
    const m = scene.c.member;
    const d = await (await m.get(`/api/v1/designs/${scene.designId}`)).json();
    expect(d.role).toBe('editor');
    expect((await (await m.get('/api/v1/designs')).json()).designs.map((x: { id: string }) => x.id)).toContain(scene.designId);
    expect((await scene.c.groupAdmin.del(`/api/v1/groups/${scene.groupId}/members/${scene.people.member.id}`)).status).toBe(204);
    for (const path of [`/api/v1/designs/${scene.designId}`, `/api/v1/designs/${scene.designId}/revisions`, `/api/v1/designs/${scene.designId}/reviews`, `/api/v1/designs/${scene.designId}/group`]) {
      const r = await m.get(path);
      expect({ path, status: r.status }).toEqual({ path, status: 404 });
      expect(await r.text()).not.toContain('Revocation coil 6102');
    }
    expect((await m.put(`/api/v1/designs/${scene.designId}`, { design: toroidCoil, revision: d.revision })).status).toBe(404);
    expect((await (await m.get('/api/v1/designs')).json()).designs.map((x: { id: string }) => x.id)).not.toContain(scene.designId);
    expect((await m.get(`/designs/${scene.designId}`)).status).toBe(404);
    expect((await (await scene.c.groupAdmin.get(`/api/v1/designs/${scene.designId}`)).json()).revision).toBe(d.revision);
  });

  it('a member leaves by removing themselves; the admin cannot leave before handing the role on', async () => {
    const scene = await groupScene(s.url, 'Leaving circle', 'Leaving coil');
    expect((await scene.c.member.del(`/api/v1/groups/${scene.groupId}/members/${scene.people.member.id}`)).status).toBe(204);
    expect((await scene.c.member.get(`/api/v1/designs/${scene.designId}`)).status).toBe(404);
    expect((await (await scene.c.member.get('/api/v1/groups')).json()).groups).toEqual([]);
    expect((await scene.c.outsider.del(`/api/v1/groups/${scene.groupId}/members/${scene.people.outsider.id}`)).status).toBe(404);
  });

  it('POST /groups/:groupId/transfer hands the admin role on; the old admin stays as a member; others are refused', async () => {
    const scene = await groupScene(s.url, 'Transfer circle', 'Transfer coil');
    const got = await matrix((w) => scene.c[w].post(`/api/v1/groups/${scene.groupId}/transfer`, { userId: scene.people.supervisor.id }), undefined, ['siteAdmin', 'supervisor', 'member', 'outsider', 'anonymous', 'groupAdmin']);
    expect(got).toEqual(adminOnly(200));
    const g = await (await scene.c.supervisor.get(`/api/v1/groups/${scene.groupId}`)).json();
    expect(Object.fromEntries(g.members.map((m: { userId: string; role: string }) => [m.userId, m.role]))).toEqual({
      [scene.people.supervisor.id]: 'admin',
      [scene.people.groupAdmin.id]: 'member',
      [scene.people.member.id]: 'member',
    });
    // The old admin still owns the design; the new admin can now manage the group.
    expect((await (await scene.c.groupAdmin.get(`/api/v1/designs/${scene.designId}`)).json()).role).toBe('owner');
    const bad = await scene.c.supervisor.post(`/api/v1/groups/${scene.groupId}/transfer`, { userId: scene.people.outsider.id });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('userId');
    expect((await scene.c.supervisor.post(`/api/v1/groups/${scene.groupId}/transfer`, {})).status).toBe(400);
  });
});

describe('designs in a group', () => {
  it('group members reach the design with the role their group role grants; others see nothing', async () => {
    const got = await matrix((w) => c[w].get(`/api/v1/designs/${designId}`), DESIGN);
    expect(got).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
    const roles: Record<string, string> = {};
    for (const w of ['siteAdmin', 'groupAdmin', 'supervisor', 'member'] as const) roles[w] = (await (await c[w].get(`/api/v1/designs/${designId}`)).json()).role;
    expect(roles).toEqual({ siteAdmin: 'admin', groupAdmin: 'owner', supervisor: 'editor', member: 'editor' });
    for (const path of [`/api/v1/designs/${designId}/revisions`, `/api/v1/designs/${designId}/members`, `/api/v1/designs/${designId}/summary?format=text`, `/api/v1/designs/${designId}/export`]) {
      expect({ path, ...(await matrix((w) => c[w].get(path), DESIGN)) }).toEqual({ path, siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
    }
    for (const path of [`/designs/${designId}`, `/designs/${designId}/people`, `/designs/${designId}/build`, `/designs/${designId}/event`, `/designs/${designId}/review`]) {
      const got: Partial<Record<Who, number>> = {};
      for (const w of everyone) {
        const r = await c[w].get(path);
        got[w] = r.status;
        const html = await r.text();
        if (w === 'outsider' || w === 'anonymous') expect(html, `${w} on ${path}`).not.toContain(DESIGN);
      }
      expect({ path, ...got }).toEqual({ path, siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 302 });
    }
  });

  it('PUT /api/v1/designs/:id saves for group members as editors; the outsider and site admin change nothing', async () => {
    const got: Partial<Record<Who, number>> = {};
    for (const w of everyone) {
      const before = await (await c.groupAdmin.get(`/api/v1/designs/${designId}`)).json();
      const r = await c[w].put(`/api/v1/designs/${designId}`, { design: toroidCoil, revision: before.revision, message: `by ${w}` });
      got[w] = r.status;
      if (r.status >= 400) expect((await (await c.groupAdmin.get(`/api/v1/designs/${designId}`)).json()).revision).toBe(before.revision);
    }
    expect(got).toEqual({ siteAdmin: 403, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
  });

  it('owner-only design routes stay the owner’s: group people cannot delete, share, invite or transfer it', async () => {
    const refused = { siteAdmin: 403, supervisor: 403, member: 403, outsider: 404, anonymous: 401 };
    const order: Who[] = ['siteAdmin', 'supervisor', 'member', 'outsider', 'anonymous'];
    expect(await matrix((w) => c[w].del(`/api/v1/designs/${designId}`), DESIGN, order)).toEqual(refused);
    expect(await matrix((w) => c[w].post(`/api/v1/designs/${designId}/share`), DESIGN, order)).toEqual(refused);
    expect(await matrix((w) => c[w].post(`/api/v1/designs/${designId}/invitations`, { email: uniqueEmail('nobody'), role: 'viewer' }), DESIGN, order)).toEqual(refused);
    expect(await matrix((w) => c[w].post(`/api/v1/designs/${designId}/transfer`, { userId: people.member.id }), DESIGN, order)).toEqual(refused);
    expect((await (await c.groupAdmin.get(`/api/v1/designs/${designId}`)).json()).role).toBe('owner');
    expect((await (await c.groupAdmin.get(`/api/v1/designs/${designId}/share`)).json()).shares).toEqual([]);
  });

  it('GET /api/v1/designs lists the group’s designs with the group’s name for its members', async () => {
    const row = async (w: Who) => ((await (await c[w].get('/api/v1/designs')).json()).designs as Array<{ id: string; role: string; groupId: string | null; groupName: string | null }>).find((d) => d.id === designId);
    expect(await row('member')).toMatchObject({ role: 'editor', groupId, groupName: GROUP });
    expect(await row('supervisor')).toMatchObject({ role: 'editor', groupId });
    expect(await row('groupAdmin')).toMatchObject({ role: 'owner', groupId });
    expect(await row('outsider')).toBeUndefined();
  });

  it('GET and PUT /api/v1/designs/:id/group: readable like the design; only the owner moves it, into a group of their own', async () => {
    expect(await matrix((w) => c[w].get(`/api/v1/designs/${designId}/group`), DESIGN)).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
    const g = await (await c.member.get(`/api/v1/designs/${designId}/group`)).json();
    expect(g).toMatchObject({ groupId, groupName: GROUP });
    expect(g.members.map((m: { groupRole: string; reviews: boolean }) => [m.groupRole, m.reviews])).toEqual([['admin', false], ['supervisor', true], ['member', false]]);
    const put = await matrix((w) => c[w].put(`/api/v1/designs/${designId}/group`, { groupId }), DESIGN);
    expect(put).toEqual({ siteAdmin: 403, groupAdmin: 200, supervisor: 403, member: 403, outsider: 404, anonymous: 401 });
    const foreign = (await (await c.outsider.post('/api/v1/groups', { name: 'Foreign circle' })).json()).id;
    const bad = await c.groupAdmin.put(`/api/v1/designs/${designId}/group`, { groupId: foreign });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('groupId');
    expect((await c.groupAdmin.put(`/api/v1/designs/${designId}/group`, { group: 'x' })).status).toBe(400);
    expect((await (await c.groupAdmin.get(`/api/v1/designs/${designId}`)).json()).groupId).toBe(groupId);
  });

  it('taking a design out of its group (groupId null) ends the members’ access to it', async () => {
    const { id } = await createDesign(c.groupAdmin, 'Solo coil');
    await groupDesign(c.groupAdmin, groupId, 'Another group coil');
    expect((await c.groupAdmin.put(`/api/v1/designs/${id}/group`, { groupId })).status).toBe(200);
    expect((await c.member.get(`/api/v1/designs/${id}`)).status).toBe(200);
    const out = await c.groupAdmin.put(`/api/v1/designs/${id}/group`, { groupId: null });
    expect(await out.json()).toEqual({ groupId: null, groupName: null, members: [] });
    expect((await c.member.get(`/api/v1/designs/${id}`)).status).toBe(404);
  });

  it('a direct viewer who is also in the group gets the stronger role (editor)', async () => {
    const owner = await verifiedUser(s.url, 'Owner Oona');
    const g = (await (await owner.c.post('/api/v1/groups', { name: 'Overlap circle' })).json()).id;
    const both = await signUp(s.url, 'Both Bo');
    await joinGroup(s.url, owner.c, g, both, 'member');
    const id = await groupDesign(owner.c, g, 'Overlap coil');
    const inv = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: both.email, role: 'viewer' });
    expect(inv.status).toBe(201);
    const token = tokenFromLink(linkIn((await waitForMail(s.url, both.email, 'Invitation to the coil design')).text), '/invitations/');
    expect((await both.c.post(`/api/v1/invitations/${token}/accept`)).status).toBe(200);
    expect((await (await both.c.get(`/api/v1/designs/${id}`)).json()).role).toBe('editor');
  });
});
