import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { waitForMail, type Client } from '../helpers/client';
import { signUp } from '../helpers/accounts';
import { toroidCoil } from './designs-fixtures';
import { caughtMail, everyone, groupDesign, groupScene, joinGroup, matrix, type Person, type Who } from './groups-fixtures';
import { firstLightChecklist } from '../../src/lib/review';

/**
 * First-light reviews over every route × site admin, group admin (the design's owner), supervisor, member, outsider
 * and anonymous. A failed request stores nothing and sends no mail; the requester never decides their own request.
 */

const GROUP = 'Quayside coil bench 3317';
const DESIGN = 'Quayside spark coil 7405';
const keys = firstLightChecklist(toroidCoil).items.map((i) => i.key);
const allOk = () => keys.map((item) => ({ item, status: 'ok', note: '' }));

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

type Review = { id: string; revision: number; state: string; current: boolean; reviewer: string | null; requestedBy: string; canDecide?: boolean; findings?: unknown[] };
const reviewsOf = async (id: string, who: Client = c.groupAdmin) => (await (await who.get(`/api/v1/designs/${id}/reviews`)).json()).reviews as Review[];
const revisionOf = async (id: string) => (await (await c.groupAdmin.get(`/api/v1/designs/${id}`)).json()).revision as number;
const request = (who: Client, id: string, body: Record<string, unknown>) => who.post(`/api/v1/designs/${id}/reviews`, body);

describe('GET /api/v1/designs/:id/reviews', () => {
  it('has the design’s access: group people and site admins read it, an outsider gets 404 without the name', async () => {
    expect(await matrix((w) => c[w].get(`/api/v1/designs/${designId}/reviews`), DESIGN)).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
    expect(await reviewsOf(designId)).toEqual([]);
  });
});

describe('POST /api/v1/designs/:id/reviews', () => {
  it('the owner and group members who edit may ask; the site admin (read only), an outsider and anonymous may not', async () => {
    const ids = {} as Record<Who, string>;
    for (const w of everyone) ids[w] = await groupDesign(c.groupAdmin, groupId, `Request matrix coil (${w})`);
    const got = await matrix((w) => request(c[w], ids[w], { revision: 1 }), 'Request matrix coil');
    // A supervisor asking "the group's supervisors" is left with nobody but themselves: they must name a reviewer.
    expect(got).toEqual({ siteAdmin: 403, groupAdmin: 201, supervisor: 400, member: 201, outsider: 404, anonymous: 401 });
    for (const w of ['siteAdmin', 'supervisor', 'outsider', 'anonymous'] as const) expect(await reviewsOf(ids[w])).toEqual([]);
    expect((await reviewsOf(ids.member))[0]).toMatchObject({ revision: 1, state: 'requested', requestedBy: 'Member Mo', reviewer: null, askedOf: 'supervisors', current: true, decidedAt: null });
    const named = await request(c.supervisor, ids.supervisor, { revision: 1, reviewerId: people.groupAdmin.id });
    expect(named.status).toBe(201);
    expect(await named.json()).toMatchObject({ askedOf: 'reviewer', reviewer: 'Admin Ada' });
  });

  it('mails the group’s supervisors, not the requester, with a link to the checklist', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Mail check coil 2290');
    const r = await request(c.member, id, { revision: 1, note: 'Bank rebuilt' });
    expect(r.status).toBe(201);
    const review = await r.json();
    const mail = await waitForMail(s.url, people.supervisor.email, 'Mail check coil 2290');
    expect(mail.subject).toBe('First-light review requested: “Mail check coil 2290” revision 1');
    expect(mail.text).toContain(`/designs/${id}/review?review=${review.id}`);
    expect(mail.text).toContain('Bank rebuilt');
    expect((await caughtMail(s.url)).some((m) => m.to.includes(people.member.email) && m.subject.includes('Mail check coil 2290'))).toBe(false);
  });

  it('refused requests store nothing and send nothing: bad revision, self as reviewer, an outsider as reviewer, no group, one open already', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Refusal coil 4471');
    const mailBefore = (await caughtMail(s.url)).length;
    const cases: Array<[Record<string, unknown>, number, string]> = [
      [{ revision: 9 }, 400, 'revision'],
      [{ revision: 0 }, 400, 'revision'],
      [{ revision: 'one' }, 400, 'revision'],
      [{}, 400, 'revision'],
      [{ revision: 1, reviewerId: people.member.id }, 400, 'reviewerId'],
      [{ revision: 1, reviewerId: people.outsider.id }, 400, 'reviewerId'],
      [{ revision: 1, reviewerId: 'no-such-person' }, 400, 'reviewerId'],
      [{ revision: 1, note: 'x'.repeat(1001) }, 400, 'note'],
    ];
    for (const [body, status, path] of cases) {
      const r = await request(c.member, id, body);
      expect({ body, status: r.status }).toEqual({ body, status });
      expect((await r.json()).error.issues[0].path).toBe(path);
    }
    expect(await reviewsOf(id)).toEqual([]);
    // A design in no group needs a named reviewer.
    const solo = (await (await c.member.post('/api/v1/designs', { name: 'Member solo coil', design: toroidCoil })).json()).id;
    const r = await request(c.member, solo, { revision: 1 });
    expect(r.status).toBe(400);
    expect((await r.json()).error.issues[0].path).toBe('reviewerId');
    expect((await caughtMail(s.url)).length).toBe(mailBefore);
    // One waiting request at a time.
    expect((await request(c.member, id, { revision: 1 })).status).toBe(201);
    const again = await request(c.groupAdmin, id, { revision: 1 });
    expect(again.status).toBe(409);
    expect(await reviewsOf(id)).toHaveLength(1);
  });
});

describe('GET /api/v1/designs/:id/reviews/:reviewId', () => {
  it('gives the checklist of the reviewed revision to everyone who reads the design; only the supervisor may decide', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Checklist coil 6618');
    const { id: reviewId } = await (await request(c.member, id, { revision: 1 })).json();
    const path = `/api/v1/designs/${id}/reviews/${reviewId}`;
    expect(await matrix((w) => c[w].get(path), 'Checklist coil 6618')).toEqual({ siteAdmin: 200, groupAdmin: 200, supervisor: 200, member: 200, outsider: 404, anonymous: 401 });
    const can: Record<string, boolean> = {};
    for (const w of ['siteAdmin', 'groupAdmin', 'supervisor', 'member'] as const) can[w] = (await (await c[w].get(path)).json()).canDecide;
    expect(can).toEqual({ siteAdmin: false, groupAdmin: false, supervisor: true, member: false });
    const r = await (await c.supervisor.get(path)).json();
    expect(r.family).toBe('spark-gap');
    expect(r.checklist.map((i: { key: string }) => i.key)).toEqual(keys);
    expect(r.findings).toEqual([]);
    expect((await c.supervisor.get(`/api/v1/designs/${id}/reviews/00000000-0000-0000-0000-000000000000`)).status).toBe(404);
    expect((await c.supervisor.get(`/api/v1/designs/${designId}/reviews/${reviewId}`)).status).toBe(404);
  });
});

describe('POST /api/v1/designs/:id/reviews/:reviewId/decision', () => {
  it('only the group’s supervisor decides; the requester, the admin, the site admin, an outsider and anonymous are refused and nothing is stored', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Decision coil 5530');
    const { id: reviewId } = await (await request(c.member, id, { revision: 1 })).json();
    const path = `/api/v1/designs/${id}/reviews/${reviewId}/decision`;
    const got = await matrix((w) => c[w].post(path, { decision: 'signed_off', findings: allOk() }), 'Decision coil 5530', ['siteAdmin', 'groupAdmin', 'member', 'outsider', 'anonymous', 'supervisor']);
    expect(got).toEqual({ siteAdmin: 403, groupAdmin: 403, member: 403, outsider: 404, anonymous: 401, supervisor: 200 });
    const [review] = await reviewsOf(id);
    expect(review).toMatchObject({ state: 'signed_off', reviewer: 'Supervisor Sol', revision: 1, current: true });
    const detail = await (await c.member.get(`/api/v1/designs/${id}/reviews/${reviewId}`)).json();
    expect(detail.findings).toHaveLength(keys.length);
    expect(detail.canDecide).toBe(false);
    expect((await c.supervisor.post(path, { decision: 'changes_requested', findings: [{ item: 'bleeders', status: 'change', note: 'late' }] })).status).toBe(409);
    expect((await reviewsOf(id))[0].state).toBe('signed_off');
  });

  it('a reviewer cannot sign off their own request, even when they are a supervisor or the named reviewer', async () => {
    const second = await signUp(s.url, 'Second Sage');
    await joinGroup(s.url, c.groupAdmin, groupId, second, 'supervisor');
    const id = await groupDesign(c.groupAdmin, groupId, 'Self sign-off coil');
    const { id: reviewId } = await (await request(c.supervisor, id, { revision: 1 })).json();
    const mine = await (await c.supervisor.get(`/api/v1/designs/${id}/reviews/${reviewId}`)).json();
    expect(mine.canDecide).toBe(false);
    const self = await c.supervisor.post(`/api/v1/designs/${id}/reviews/${reviewId}/decision`, { decision: 'signed_off', findings: allOk() });
    expect(self.status).toBe(403);
    expect((await self.json()).error.message).toContain('someone else must decide');
    expect((await reviewsOf(id))[0].state).toBe('requested');
    expect((await (await second.c.get(`/api/v1/designs/${id}/reviews/${reviewId}`)).json()).canDecide).toBe(true);
    expect((await second.c.post(`/api/v1/designs/${id}/reviews/${reviewId}/decision`, { decision: 'signed_off', findings: allOk() })).status).toBe(200);
    expect((await c.groupAdmin.del(`/api/v1/groups/${groupId}/members/${second.id}`)).status).toBe(204);
  });

  it('a named reviewer decides, the group’s supervisors then do not', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Named reviewer coil');
    const { id: reviewId } = await (await request(c.member, id, { revision: 1, reviewerId: people.groupAdmin.id })).json();
    const path = `/api/v1/designs/${id}/reviews/${reviewId}/decision`;
    expect((await c.supervisor.post(path, { decision: 'signed_off', findings: allOk() })).status).toBe(403);
    expect((await c.groupAdmin.post(path, { decision: 'changes_requested', findings: [{ item: 'rf-ground', status: 'change', note: 'Base goes to the outlet earth' }] })).status).toBe(200);
    expect((await reviewsOf(id))[0]).toMatchObject({ state: 'changes_requested', reviewer: 'Admin Ada' });
  });

  it('a sign-off needs every item checked; changes need at least one item marked; bad findings name their field; nothing is stored', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Incomplete coil');
    const { id: reviewId } = await (await request(c.member, id, { revision: 1 })).json();
    const path = `/api/v1/designs/${id}/reviews/${reviewId}/decision`;
    const mailBefore = (await caughtMail(s.url)).length;
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ decision: 'signed_off', findings: allOk().slice(1) }, 'findings'],
      [{ decision: 'signed_off', findings: allOk().map((f, i) => (i === 0 ? { ...f, status: 'change', note: 'gap too wide' } : f)) }, 'findings'],
      [{ decision: 'changes_requested', findings: allOk() }, 'findings'],
      [{ decision: 'changes_requested', findings: [{ item: 'bleeders', status: 'change', note: '' }] }, 'findings.0.note'],
      [{ decision: 'changes_requested', findings: [{ item: 'no-such-item', status: 'change', note: 'x' }] }, 'findings.0.item'],
      [{ decision: 'signed_off', findings: [...allOk(), { item: keys[0], status: 'ok', note: '' }] }, `findings.${keys.length}.item`],
      [{ decision: 'maybe', findings: [] }, 'decision'],
      [{ decision: 'signed_off', findings: [{ item: 'bleeders', status: 'fine' }] }, 'findings.0.status'],
    ];
    for (const [body, field] of cases) {
      const r = await c.supervisor.post(path, body);
      expect({ body, status: r.status }).toEqual({ body, status: 400 });
      expect((await r.json()).error.issues.map((i: { path: string }) => i.path)).toContain(field);
    }
    const detail = await (await c.supervisor.get(`/api/v1/designs/${id}/reviews/${reviewId}`)).json();
    expect(detail).toMatchObject({ state: 'requested', findings: [], decidedAt: null });
    expect((await caughtMail(s.url)).length).toBe(mailBefore);
  });

  it('the decision is bound to its revision: a later save makes the sign-off out of date until reviewed again', async () => {
    const id = await groupDesign(c.groupAdmin, groupId, 'Bound revision coil 3904');
    const { id: first } = await (await request(c.member, id, { revision: 1 })).json();
    const fix = [{ item: 'bleeders', status: 'change', note: 'Fit bleeders on every capacitor' }];
    expect((await c.supervisor.post(`/api/v1/designs/${id}/reviews/${first}/decision`, { decision: 'changes_requested', findings: fix, note: 'One change' })).status).toBe(200);
    const changesMail = await waitForMail(s.url, people.member.email, 'Changes requested: “Bound revision coil 3904”');
    expect(changesMail.text).toContain('Bleeders on the tank capacitors: Fit bleeders on every capacitor');
    // The member fixes it, saves revision 2 and asks again.
    const saved = await c.member.put(`/api/v1/designs/${id}`, { design: toroidCoil, revision: 1, message: 'bleeders fitted' });
    expect(saved.status).toBe(200);
    const { id: second } = await (await request(c.member, id, { revision: 2 })).json();
    expect((await c.supervisor.post(`/api/v1/designs/${id}/reviews/${second}/decision`, { decision: 'signed_off', findings: allOk() })).status).toBe(200);
    await waitForMail(s.url, people.member.email, 'Signed off for first light: “Bound revision coil 3904” revision 2');
    expect((await reviewsOf(id))[0]).toMatchObject({ revision: 2, state: 'signed_off', current: true });
    let page = await (await c.member.get(`/designs/${id}`)).text();
    expect(page.includes('Signed off for first light: revision 2')).toBe(true);
    // Any later save leaves the sign-off behind.
    expect((await c.member.put(`/api/v1/designs/${id}`, { design: toroidCoil, revision: 2, message: 'moved the tap' })).status).toBe(200);
    expect(await revisionOf(id)).toBe(3);
    const [latest] = await reviewsOf(id);
    expect(latest).toMatchObject({ revision: 2, state: 'signed_off', current: false });
    for (const path of [`/designs/${id}`, `/designs/${id}/build`, `/designs/${id}/event`, `/designs/${id}/review`]) {
      page = await (await c.member.get(path)).text();
      expect({ path, shows: page.includes('Signed off revision 2; changed since') }).toEqual({ path, shows: true });
    }
  });

  it('a supervisor removed from the group can no longer see or decide the review', async () => {
    const gone = await signUp(s.url, 'Gone Gus');
    await joinGroup(s.url, c.groupAdmin, groupId, gone, 'supervisor');
    const id = await groupDesign(c.groupAdmin, groupId, 'Removed reviewer coil');
    const { id: reviewId } = await (await request(c.member, id, { revision: 1 })).json();
    expect((await (await gone.c.get(`/api/v1/designs/${id}/reviews/${reviewId}`)).json()).canDecide).toBe(true);
    expect((await c.groupAdmin.del(`/api/v1/groups/${groupId}/members/${gone.id}`)).status).toBe(204);
    const r = await gone.c.post(`/api/v1/designs/${id}/reviews/${reviewId}/decision`, { decision: 'signed_off', findings: allOk() });
    expect(r.status).toBe(404);
    expect((await reviewsOf(id))[0].state).toBe('requested');
  });
});

describe('the demo scenario', () => {
  it('the Harbour Lane coil club has a supervisor; one of its designs is signed off, the other has changes requested', async () => {
    const { demoAccounts } = await import('../../scripts/seed-demo');
    const { Client } = await import('../helpers/client');
    const oriel = new Client(s.url);
    await oriel.signIn(demoAccounts.supervisor.email, demoAccounts.supervisor.password);
    const groups = (await (await oriel.get('/api/v1/groups')).json()).groups;
    expect(groups).toEqual([expect.objectContaining({ name: 'Harbour Lane coil club', role: 'supervisor', memberCount: 3 })]);
    const designs = ((await (await oriel.get('/api/v1/designs')).json()).designs as Array<{ id: string; name: string; groupName: string | null; role: string }>).filter((d) => d.groupName === 'Harbour Lane coil club');
    expect(designs).toHaveLength(2);
    const states: string[] = [];
    for (const d of designs) {
      expect(d.role).toBe('editor');
      const [latest] = await reviewsOf(d.id, oriel);
      states.push(latest.state);
      expect(latest).toMatchObject({ reviewer: 'Oriel Dunmore', current: true });
      const page = await (await oriel.get(`/designs/${d.id}`)).text();
      expect(page.includes(latest.state === 'signed_off' ? 'Signed off for first light: revision 1' : 'Changes requested on revision 1')).toBe(true);
    }
    expect(states.sort()).toEqual(['changes_requested', 'signed_off']);
  });
});
