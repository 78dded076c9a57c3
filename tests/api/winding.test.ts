import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { addMember, verifiedUser } from './designs-fixtures';
import { exampleDesigns } from '~/lib/design';
import type { WindingSession } from '~/lib/api/contracts';

type Result = { secondary: { inductance: number; windingLength: number; pitch: number }; system: { resonantFrequency: number } };

let s: TestServer;
let owner: Client;
let editor: Client;
let viewer: Client;
let stranger: Client;
let anon: Client;
let id: string;
let result: Result;
let pitch: number;
let sessionId: string;
const T0 = Date.now() - 3600e3;
const at = (minutes: number) => new Date(T0 + minutes * 60e3).toISOString();
const OFFSET = 0.0381;

beforeAll(async () => {
  s = await startServer();
  const o = await verifiedUser(s.url, 'Winding Owner');
  const e = await signUp(s.url, 'Winding Editor');
  const v = await signUp(s.url, 'Winding Viewer');
  owner = o.c;
  editor = e.c;
  viewer = v.c;
  stranger = (await signUp(s.url, 'Winding Stranger')).c;
  anon = new Client(s.url);
  const created = await createDesign(owner, 'Winding coil', exampleDesigns.find((x) => x.id === 'sign-transformer-toroid')!.design);
  id = created.id;
  result = created.result as Result;
  pitch = result.secondary.windingLength / 1000;
  await addMember(s.url, owner, id, e, 'editor');
  await addMember(s.url, owner, id, v, 'viewer');
});
afterAll(async () => {
  await s?.stop();
});

const base = () => `/api/v1/designs/${id}/winding`;
async function session(c: Client = owner): Promise<WindingSession> {
  const r = await c.get(`${base()}/${sessionId}`);
  expect(r.status).toBe(200);
  return r.json();
}

describe('POST /api/v1/designs/:id/winding', () => {
  it('POST winding refuses a bad winder speed naming rpm by its label, and starts nothing', async () => {
    const r = await owner.post(base(), { rpm: 0 });
    expect(r.status).toBe(400);
    const body = await r.json();
    expect(body.error.issues[0].path).toBe('rpm');
    expect(body.error.issues[0].message).toMatch(/^Winder speed/);
    expect((await (await owner.get(base())).json()).sessions).toHaveLength(0);
  });

  it('POST winding is refused to a viewer (403), a stranger (404) and an anonymous caller (401)', async () => {
    expect((await viewer.post(base(), { rpm: 40 })).status).toBe(403);
    expect((await stranger.post(base(), { rpm: 40 })).status).toBe(404);
    expect((await anon.post(base(), { rpm: 40 })).status).toBe(401);
  });

  it('POST winding by an editor starts a session with the design’s plan; a second start is a conflict', async () => {
    const r = await editor.post(base(), { rpm: 40, spoolLength: 400, startOffset: OFFSET, startedAt: at(0) });
    expect(r.status).toBe(201);
    const sess = (await r.json()) as WindingSession;
    sessionId = sess.id;
    expect(sess.status).toBe('running');
    expect(sess.plan.turns).toBe(1000);
    expect(sess.plan.pitch).toBeCloseTo(pitch, 12);
    expect(sess.plan.pitchSource).toBe('insulated-diameter');
    expect(sess.formLength).toBeCloseTo(result.secondary.windingLength + 2 * OFFSET, 12);
    expect(sess.tolerance).toMatch(/±1 mm/);
    const again = await owner.post(base(), { rpm: 40 });
    expect(again.status).toBe(409);
    expect((await again.json()).error.sessionId).toBe(sessionId);
  });

  it('GET winding hides a session under way from a viewer and a stranger', async () => {
    expect((await (await viewer.get(base())).json()).sessions).toHaveLength(0);
    expect((await viewer.get(`${base()}/${sessionId}`)).status).toBe(404);
    expect((await stranger.get(base())).status).toBe(404);
  });
});

describe('POST …/winding/:sessionId/readings', () => {
  const first = randomUUID();
  const lagging = randomUUID();

  it('POST readings stores a reading that agrees with its height, unflagged', async () => {
    const r = await owner.post(`${base()}/${sessionId}/readings`, { id: first, at: at(2.5), counter: 100, height: 100 * pitch, datum: 'first-turn' });
    expect(r.status).toBe(201);
    const body = await r.json();
    expect(body.stored).toBe(true);
    expect(body.reading.estimatedTurns).toBeCloseTo(100, 9);
    expect(body.reading.flag).toBeNull();
    expect(body.reading.expectedTurns).toBeCloseTo(100, 9); // 2.5 min at 40 rpm
  });

  it('POST readings refuses a count that goes backwards, naming the counter, and saves nothing', async () => {
    const r = await owner.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(3), counter: 90 });
    expect(r.status).toBe(400);
    const body = await r.json();
    expect(body.error.issues).toEqual([{ path: 'counter', message: expect.stringMatching(/^Counter reading 90 is below the last reading, 100/) }]);
    expect((await session()).readings).toHaveLength(1);
  });

  it('POST readings refuses a height beyond the form from either datum, naming the height, and saves nothing', async () => {
    const sess = await session();
    for (const [height, datum] of [
      [sess.formLength + 0.001, 'form-end'],
      [sess.formLength - OFFSET + 0.001, 'first-turn'],
      [OFFSET / 2, 'form-end'],
    ] as const) {
      const r = await owner.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(3), counter: 120, height, datum });
      expect(r.status, `${height} ${datum}`).toBe(400);
      const body = await r.json();
      expect(body.error.issues[0].path).toBe('height');
      expect(body.error.issues[0].message).toMatch(/^Measured height/);
    }
    expect((await session()).readings).toHaveLength(1);
  });

  it('POST readings refuses a height without its datum and a reading by a viewer', async () => {
    const r = await owner.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(3), counter: 120, height: 0.05 });
    expect(r.status).toBe(400);
    expect((await r.json()).error.issues[0].path).toBe('datum');
    expect((await viewer.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(3), counter: 120 })).status).toBe(403);
    expect((await session()).readings).toHaveLength(1);
  });

  it('POST readings flags a counter that lags the height, with the likely cause and the corrected count', async () => {
    // 330 turns above the first turn, measured from the form end; the counter shows 300
    const r = await owner.post(`${base()}/${sessionId}/readings`, { id: lagging, at: at(8.5), counter: 300, height: OFFSET + 330 * pitch, datum: 'form-end' });
    expect(r.status).toBe(201);
    const { reading } = await r.json();
    expect(reading.estimatedTurns).toBeCloseTo(330, 6);
    expect(reading.flag.direction).toBe('counter-low');
    expect(reading.flag.correctedCount).toBe(330);
    expect(reading.flag.cause).toMatch(/missing counts/);
    expect(reading.flag.advice).toMatch(/dwell/);
    expect(reading.tolerance).toBeLessThan(30);
  });

  it('POST readings with an id already stored adds nothing and answers 200 with stored: false', async () => {
    const r = await owner.post(`${base()}/${sessionId}/readings`, { id: lagging, at: at(8.5), counter: 300, height: OFFSET + 330 * pitch, datum: 'form-end' });
    expect(r.status).toBe(200);
    expect((await r.json()).stored).toBe(false);
    const sess = await session();
    expect(sess.readings.map((x) => x.id)).toEqual([first, lagging]);
    expect(sess.bestTurns).toBe(330);
  });
});

describe('pause, resume and finish', () => {
  it('POST pause and resume take the pause out of the winding time', async () => {
    const p = await owner.post(`${base()}/${sessionId}/pause`, { reason: 'splice', note: 'joined the second spool', at: at(10) });
    expect(p.status).toBe(200);
    expect(((await p.json()) as WindingSession).status).toBe('paused');
    expect((await owner.post(`${base()}/${sessionId}/pause`, { reason: 'break', at: at(11) })).status).toBe(409);
    const bad = await owner.post(`${base()}/${sessionId}/resume`, { at: at(11), reason: 'nap' });
    expect(bad.status).toBe(400);
    const r = await owner.post(`${base()}/${sessionId}/resume`, { at: at(15) });
    expect(r.status).toBe(200);
    const rd = await owner.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(20), counter: 560 });
    const { reading, session: sess } = await rd.json();
    expect(reading.elapsed).toBe(15 * 60); // 20 min less the 5-minute splice
    expect(reading.bestTurns).toBe(590); // the 30 missed counts carried on
    expect(sess.pauses).toEqual([expect.objectContaining({ reason: 'splice', note: 'joined the second spool', endedAt: at(15) })]);
  });

  it('POST finish refuses a winding longer than the form, naming it, and leaves the session under way', async () => {
    const sess = await session();
    const r = await owner.post(`${base()}/${sessionId}/finish`, { at: at(30), woundTurns: 1030, windingLength: sess.formLength });
    expect(r.status).toBe(400);
    expect((await r.json()).error.issues[0].message).toMatch(/^Winding length, measured/);
    expect((await session()).status).toBe('running');
    const log = await (await owner.get(`/api/v1/designs/${id}/measurements`)).json();
    expect(log.measurements).toHaveLength(0);
  });

  it('POST finish records the wound turns and measured length in the bench log as their own kinds', async () => {
    const r = await owner.post(`${base()}/${sessionId}/finish`, { at: at(30), woundTurns: 1030, windingLength: 1030 * pitch });
    expect(r.status).toBe(200);
    const sess = (await r.json()) as WindingSession;
    expect(sess.status).toBe('finished');
    expect(sess.woundTurns).toBe(1030);
    const log = await (await owner.get(`/api/v1/designs/${id}/measurements`)).json();
    const byKind = Object.fromEntries(log.measurements.map((m: { kind: string }) => [m.kind, m]));
    expect(byKind['wound-turns']).toMatchObject({ value: 1030, unit: 'turns', predicted: 1000, label: 'Secondary turns wound' });
    expect(byKind['winding-length'].value).toBeCloseTo(1030 * pitch, 12);
    expect(byKind['winding-length'].predicted).toBeCloseTo(result.secondary.windingLength, 12);
    expect((await owner.post(`${base()}/${sessionId}/readings`, { id: randomUUID(), at: at(31), counter: 1100 })).status).toBe(409);
  });

  it('GET winding shows the finished session to a viewer and through a share link', async () => {
    const v = await (await viewer.get(base())).json();
    expect(v.sessions.map((x: WindingSession) => x.id)).toEqual([sessionId]);
    const share = await owner.post(`/api/v1/designs/${id}/share`);
    expect(share.status).toBe(201);
    const { token } = await share.json();
    const shared = await anon.get(`/api/v1/shared/${token}/winding`);
    expect(shared.status).toBe(200);
    const list = (await shared.json()).sessions as WindingSession[];
    expect(list).toHaveLength(1);
    expect(list[0].readings.some((x) => x.flag?.correctedCount === 330)).toBe(true);
    expect((await anon.get('/api/v1/shared/not-a-real-token-000000/winding')).status).toBe(404);
    const pageHtml = await (await anon.get(`/s/${token}`)).text();
    expect(pageHtml).toContain('As wound');
    expect(pageHtml).toContain('counter 300, height 330');
  });

  it('GET export.csv writes the plan, each reading with its flag and the pause', async () => {
    const r = await viewer.get(`${base()}/${sessionId}/export.csv`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/^text\/csv/);
    const text = await r.text();
    expect(text).toContain('winder speed (rpm),40');
    expect(text).toContain('turns wound,1030');
    expect(text.split('\r\n').filter((l) => l.startsWith('reading,'))).toHaveLength(3);
    expect(text).toMatch(/pause,[^\r\n]*splice,joined the second spool/);
    expect(text).toMatch(/reading,[^\r\n]*,300,[^\r\n]*missing counts[^\r\n]*,330,/);
  });
});

describe('POST …/adopt and PUT …/checklist', () => {
  it('POST adopt is refused to a viewer and saves nothing', async () => {
    expect((await viewer.post(`${base()}/${sessionId}/adopt`)).status).toBe(403);
    expect((await (await owner.get(`/api/v1/designs/${id}`)).json()).revision).toBe(1);
  });

  it('POST adopt saves a new revision with the wound turns and winding length, and the results follow', async () => {
    const r = await owner.post(`${base()}/${sessionId}/adopt`);
    expect(r.status, await r.clone().text()).toBe(200);
    const { session: sess, design } = await r.json();
    expect(design.revision).toBe(2);
    expect(sess.adoptedRevision).toBe(2);
    expect(design.design.secondary.turns).toBe(1030);
    const after = design.result as Result;
    expect(after.secondary.windingLength).toBeCloseTo(1030 * pitch, 4);
    expect(after.secondary.inductance).toBeGreaterThan(result.secondary.inductance);
    expect(after.system.resonantFrequency).toBeLessThan(result.system.resonantFrequency);
    const revs = await (await owner.get(`/api/v1/designs/${id}/revisions`)).json();
    expect(revs[0]?.message ?? revs.revisions?.[0]?.message).toMatch(/As wound: 1030 turns/);
    expect((await owner.post(`${base()}/${sessionId}/adopt`)).status).toBe(409);
  });

  it('PUT checklist keeps the coats and drying time; a bad count of coats is refused naming it', async () => {
    const bad = await editor.put(`${base()}/${sessionId}/checklist`, { coats: 2.5 });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0]).toMatchObject({ path: 'coats', message: expect.stringMatching(/^Coats/) });
    const r = await editor.put(`${base()}/${sessionId}/checklist`, { baseEndFastened: true, topEndFastened: true, coating: 'oil-based polyurethane', coats: 4, dryingHours: 12 });
    expect(r.status).toBe(200);
    expect(((await r.json()) as WindingSession).checklist).toEqual({ baseEndFastened: true, topEndFastened: true, coating: 'oil-based polyurethane', coats: 4, dryingHours: 12, notes: null });
    const keep = await editor.put(`${base()}/${sessionId}/checklist`, { notes: 'second coat runs at the top' });
    expect(((await keep.json()) as WindingSession).checklist.coats).toBe(4);
    expect((await viewer.put(`${base()}/${sessionId}/checklist`, { coats: 5 })).status).toBe(403);
  });
});
