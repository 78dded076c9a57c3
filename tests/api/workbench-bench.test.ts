import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PDFParse } from 'pdf-parse';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { exampleDesigns } from '~/lib/design';

type Result = {
  secondary: { wireLength: number; wireMass: number; windingLength: number };
  system: { resonantFrequency: number };
  tuning: { tapTurns: number; targetFrequency: number };
  primary: { inductanceAtTap: number };
};

let s: TestServer;
let owner: Client;
let stranger: Client;
let anon: Client;
let id: string;
let result: Result;

beforeAll(async () => {
  s = await startServer();
  owner = (await signUp(s.url, 'Bench Owner')).c;
  stranger = (await signUp(s.url, 'Bench Stranger')).c;
  anon = new Client(s.url);
  const created = await createDesign(owner, 'Bench coil', exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design);
  id = created.id;
  result = created.result as Result;
});
afterAll(async () => {
  await s?.stop();
});

async function pdfText(bytes: ArrayBuffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

describe('GET /api/v1/designs/:id/build-sheet.pdf', () => {
  it('GET build-sheet.pdf parses back and carries the solver’s wire, mass, winding time and checkpoint heights', async () => {
    const r = await owner.get(`/api/v1/designs/${id}/build-sheet.pdf?rpm=40&margin=0.15&every=150`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toBe('application/pdf');
    const text = await pdfText(await r.arrayBuffer());
    const sec = result.secondary;
    expect(text).toContain(`Wire length (computed) ${sec.wireLength.toFixed(1)} m`);
    expect(text).toContain(`Wire to buy ${(sec.wireLength * 1.15).toFixed(1)} m`);
    const grams = (kg: number) => (kg < 1 ? `${(kg * 1000).toFixed(0)} g` : `${kg.toFixed(2)} kg`);
    expect(text).toContain(`Copper mass to buy ${grams(sec.wireMass * 1.15)}`);
    expect(text).toContain('Winding time 25 min 0 s'); // 1000 turns / 40 rpm
    const pitch = sec.windingLength / 1000;
    for (const n of [150, 300, 900]) expect(text).toContain(`${n} ${(n * pitch * 1000).toFixed(1)} mm`);
    expect(text).toContain(`1000 ${(sec.windingLength * 1000).toFixed(1)} mm`);
    expect(text).toMatch(/Safety checklist/);
    expect(text).toMatch(/local electrical codes/);
  });

  it('GET build-sheet.pdf refuses a bad rpm, margin or every with 400 naming it', async () => {
    for (const [q, path] of [
      ['rpm=fast', 'rpm'],
      ['rpm=0', 'rpm'],
      ['margin=-0.1', 'margin'],
      ['every=0', 'every'],
      ['every=2.5', 'every'],
      ['every=1', 'every'], // 1000 checkpoints is more than the sheet lists
    ] as const) {
      const r = await owner.get(`/api/v1/designs/${id}/build-sheet.pdf?${q}`);
      expect(r.status, q).toBe(400);
      const body = await r.json();
      expect(body.error.code).toBe('validation_failed');
      expect(body.error.issues.map((i: { path: string }) => i.path), q).toContain(path);
    }
  });

  it('GET build-sheet.pdf is 404 for a stranger and asks an anonymous caller to sign in', async () => {
    expect((await stranger.get(`/api/v1/designs/${id}/build-sheet.pdf`)).status).toBe(404);
    expect((await anon.get(`/api/v1/designs/${id}/build-sheet.pdf`)).status).toBe(401);
  });
});

describe('/api/v1/designs/:id/measurements', () => {
  it('POST measurements records a loaded frequency and GET shows it beside the prediction with the error in percent', async () => {
    const predicted = result.system.resonantFrequency;
    const r = await owner.post(`/api/v1/designs/${id}/measurements`, {
      kind: 'loaded-frequency',
      value: predicted * 0.9,
      measuredAt: '2026-03-14',
      instrument: 'signal generator + scope',
      notes: 'topload fitted, hands clear',
    });
    expect(r.status).toBe(201);
    const m = await r.json();
    expect(m.unit).toBe('Hz');
    expect(m.predicted).toBeCloseTo(predicted, 6);
    expect(m.errorPercent).toBeCloseTo(-10, 9);
    const list = await (await owner.get(`/api/v1/designs/${id}/measurements`)).json();
    expect(list.measurements.map((x: { id: string }) => x.id)).toContain(m.id);
  });

  it('POST measurements names each bad field and stores nothing', async () => {
    const before = (await (await owner.get(`/api/v1/designs/${id}/measurements`)).json()).measurements.length;
    const r = await owner.post(`/api/v1/designs/${id}/measurements`, { kind: 'voltage', value: 'lots', measuredAt: 'yesterday' });
    expect(r.status).toBe(400);
    const paths = (await r.json()).error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['kind', 'value', 'measuredAt']));
    const wrongUnit = await owner.post(`/api/v1/designs/${id}/measurements`, { kind: 'secondary-inductance', value: 12, unit: 'mH', measuredAt: '2026-03-14' });
    expect(wrongUnit.status).toBe(400);
    expect((await wrongUnit.json()).error.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(['unit', 'value']));
    const after = (await (await owner.get(`/api/v1/designs/${id}/measurements`)).json()).measurements.length;
    expect(after).toBe(before);
  });

  it('measurements routes are 404 for a stranger (read and write) and anonymous reads', async () => {
    expect((await stranger.get(`/api/v1/designs/${id}/measurements`)).status).toBe(404);
    expect((await stranger.post(`/api/v1/designs/${id}/measurements`, { kind: 'coupling', value: 0.1, measuredAt: '2026-03-14' })).status).toBe(404);
    expect((await anon.get(`/api/v1/designs/${id}/measurements`)).status).toBe(401);
  });
});

describe('/api/v1/designs/:id/calibration', () => {
  it('PUT calibration adopts the measured frequency: the tap is solved again, the prediction kept, null clears it', async () => {
    const measured = result.system.resonantFrequency * 1.05;
    const r = await owner.put(`/api/v1/designs/${id}/calibration`, { loadedFrequency: measured });
    expect(r.status).toBe(200);
    const c = await r.json();
    expect(c.calibration.loadedFrequency).toBe(measured);
    expect(c.predicted.tapTurns).toBeCloseTo(result.tuning.tapTurns, 9);
    expect(c.calibrated.tapTurns).toBeLessThan(result.tuning.tapTurns); // higher frequency: fewer turns
    expect(c.calibrated.targetFrequency).toBeGreaterThan(result.tuning.targetFrequency); // 5 % up from the predicted target

    const sheet = await owner.get(`/api/v1/designs/${id}/build-sheet.pdf`);
    expect(await pdfText(await sheet.arrayBuffer())).toContain('Tap for the adopted measurements');

    const cleared = await (await owner.put(`/api/v1/designs/${id}/calibration`, { loadedFrequency: null })).json();
    expect(cleared.calibration).toEqual({});
    expect(cleared.calibrated).toBeNull();
  });

  it('PUT calibration names a bad field, and is 404 for a stranger', async () => {
    const r = await owner.put(`/api/v1/designs/${id}/calibration`, { loadedFrequency: -5 });
    expect(r.status).toBe(400);
    expect((await r.json()).error.issues[0].path).toBe('loadedFrequency');
    expect((await stranger.put(`/api/v1/designs/${id}/calibration`, { loadedFrequency: 1e5 })).status).toBe(404);
    expect((await anon.get(`/api/v1/designs/${id}/calibration`)).status).toBe(401);
  });
});

describe('GET /api/v1/designs/:id/troubleshoot', () => {
  it('GET troubleshoot tests the causes of short sparks against the bench log and the answers', async () => {
    const r = await owner.get(`/api/v1/designs/${id}/troubleshoot?symptom=short-sparks&rfGround=no`);
    expect(r.status).toBe(200);
    const body = await r.json();
    expect(body.symptoms).toHaveLength(1);
    const causes = body.symptoms[0].causes as Array<{ ruleId: string; status: string; source: string }>;
    const byId = Object.fromEntries(causes.map((c) => [c.ruleId, c]));
    expect(byId['tap-from-prediction-off'].status).toBe('triggered'); // measured 10 % low, not adopted
    expect(byId['rf-ground'].status).toBe('triggered');
    expect(byId['tap-out-of-range'].status).toBe('clear');
    expect(causes.every((c) => c.source.length > 0)).toBe(true);
    expect(causes[0].status).toBe('triggered');
  });

  it('GET troubleshoot refuses an unknown symptom and is 404 for a stranger', async () => {
    const bad = await owner.get(`/api/v1/designs/${id}/troubleshoot?symptom=smoke`);
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('symptom');
    expect((await stranger.get(`/api/v1/designs/${id}/troubleshoot`)).status).toBe(404);
  });
});

describe('GET /api/v1/openapi.json', () => {
  it('GET openapi.json lists the workbench routes', async () => {
    const r = await fetch(`${s.url}/api/v1/openapi.json`);
    if (r.status === 404) throw new Error('openapi.json is not served yet');
    const doc = await r.json();
    expect(doc.paths['/api/v1/designs/{id}/build-sheet.pdf'].get.parameters.map((p: { name: string }) => p.name)).toEqual(expect.arrayContaining(['id', 'rpm', 'margin', 'every']));
    expect(doc.paths['/api/v1/designs/{id}/measurements'].post).toBeDefined();
    expect(doc.paths['/api/v1/attachments/{id}'].delete).toBeDefined();
  });
});
