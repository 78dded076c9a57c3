import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { createDesign, signUp } from '../helpers/accounts';
import { sphereCoil, toroidCoil } from './designs-fixtures';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

const biggerTopload = { ...toroidCoil, topload: { shape: 'toroid', majorDiameter: '24 in', minorDiameter: '6 in', elevation: '3 in' } };

describe('revisions', () => {
  it('PUT /api/v1/designs/:id with a stale revision is 409 and the stored design is unchanged', async () => {
    const { c } = await signUp(s.url, 'Stale Stig');
    const { id } = await createDesign(c, 'Stale test');
    expect((await c.put(`/api/v1/designs/${id}`, { design: biggerTopload, revision: 1, message: 'bigger toroid' })).status).toBe(200);
    const stale = await c.put(`/api/v1/designs/${id}`, { name: 'Overwritten', design: sphereCoil, revision: 1 });
    expect(stale.status).toBe(409);
    const body = await stale.json();
    expect(body.error.code).toBe('conflict');
    expect(body.error.latestRevision).toBe(2);
    const now = await (await c.get(`/api/v1/designs/${id}`)).json();
    expect(now).toMatchObject({ name: 'Stale test', revision: 2, design: biggerTopload });
    expect((await (await c.get(`/api/v1/designs/${id}/revisions`)).json()).revisions).toHaveLength(2);
  });

  it('PUT /api/v1/designs/:id with an invalid design is 400 naming the field and the stored design is unchanged', async () => {
    const { c } = await signUp(s.url, 'Invalid Ines');
    const { id } = await createDesign(c, 'Invalid test');
    const bad = await c.put(`/api/v1/designs/${id}`, { design: { ...toroidCoil, secondary: { ...toroidCoil.secondary, turns: -5 } }, revision: 1 });
    expect(bad.status).toBe(400);
    const body = await bad.json();
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.issues.map((i: { path: string }) => i.path)).toContain('design.secondary.turns');
    const wrongUnit = await c.put(`/api/v1/designs/${id}`, { design: { ...toroidCoil, secondary: { ...toroidCoil.secondary, formDiameter: '3 kg' } }, revision: 1 });
    expect(wrongUnit.status).toBe(400);
    expect((await wrongUnit.json()).error.issues.map((i: { path: string }) => i.path)).toContain('design.secondary.formDiameter');
    const now = await (await c.get(`/api/v1/designs/${id}`)).json();
    expect(now).toMatchObject({ revision: 1, design: toroidCoil });
  });

  it('GET /api/v1/designs/:id/revisions/:n opens an old revision read-only with its own result', async () => {
    const { c } = await signUp(s.url, 'Reader Rut');
    const { id } = await createDesign(c, 'History test');
    await c.put(`/api/v1/designs/${id}`, { design: biggerTopload, revision: 1, message: 'bigger toroid' });
    const r1 = await (await c.get(`/api/v1/designs/${id}/revisions/1`)).json();
    const r2 = await (await c.get(`/api/v1/designs/${id}/revisions/2`)).json();
    expect(r1.design).toEqual(toroidCoil);
    expect(r2.design).toEqual(biggerTopload);
    expect(r2.message).toBe('bigger toroid');
    // A bigger topload adds capacitance, so the loaded frequency falls.
    expect(r2.result.system.resonantFrequency).toBeLessThan(r1.result.system.resonantFrequency);
    expect((await c.get(`/api/v1/designs/${id}/revisions/3`)).status).toBe(404);
    expect((await c.get(`/api/v1/designs/${id}/revisions/zero`)).status).toBe(404);
  });

  it('GET /api/v1/designs/:id/compare lists the changed inputs and the change in loaded frequency', async () => {
    const { c } = await signUp(s.url, 'Compare Cato');
    const { id } = await createDesign(c, 'Compare test');
    await c.put(`/api/v1/designs/${id}`, { design: biggerTopload, revision: 1 });
    const r = await c.get(`/api/v1/designs/${id}/compare?from=1&to=2`);
    expect(r.status).toBe(200);
    const d = await r.json();
    expect(d.inputs).toEqual([
      { path: 'topload.majorDiameter', label: 'Toroid overall diameter', from: '20 in', to: '24 in' },
      { path: 'topload.minorDiameter', label: 'Toroid tube diameter', from: '5 in', to: '6 in' },
    ]);
    const f = d.figures.find((x: { key: string }) => x.key === 'loadedFrequency');
    const [r1, r2] = [await (await c.get(`/api/v1/designs/${id}/revisions/1`)).json(), await (await c.get(`/api/v1/designs/${id}/revisions/2`)).json()];
    expect(f.from).toBe(r1.result.system.resonantFrequency);
    expect(f.to).toBe(r2.result.system.resonantFrequency);
    expect(f.changed).toBe(true);
    expect(f.relative).toBeCloseTo((f.to - f.from) / f.from, 12);
    const turns = d.figures.find((x: { key: string }) => x.key === 'wireLength');
    expect(turns.changed).toBe(false);
    const missing = await c.get(`/api/v1/designs/${id}/compare?from=1`);
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.issues[0].path).toBe('to');
  });

  it('POST /api/v1/designs/:id/revisions/:n/restore saves the old revision as a new one; a stale base is 409', async () => {
    const { c } = await signUp(s.url, 'Restore Rosa');
    const { id } = await createDesign(c, 'Restore test');
    await c.put(`/api/v1/designs/${id}`, { name: 'Renamed', design: biggerTopload, revision: 1 });
    const r = await c.post(`/api/v1/designs/${id}/revisions/1/restore`, { revision: 2 });
    expect(r.status).toBe(201);
    expect(await r.json()).toMatchObject({ revision: 3, name: 'Restore test', design: toroidCoil });
    const revs = (await (await c.get(`/api/v1/designs/${id}/revisions`)).json()).revisions;
    expect(revs.map((x: { revision: number }) => x.revision)).toEqual([3, 2, 1]);
    expect(revs[0].message).toBe('Restored revision 1');
    const stale = await c.post(`/api/v1/designs/${id}/revisions/2/restore`, { revision: 2 });
    expect(stale.status).toBe(409);
    expect((await (await c.get(`/api/v1/designs/${id}`)).json()).revision).toBe(3);
    expect((await c.post(`/api/v1/designs/${id}/revisions/9/restore`)).status).toBe(404);
    expect((await (await c.get(`/api/v1/designs/${id}`)).json()).revision).toBe(3);
  });

  it('POST /api/v1/designs/:id/duplicate makes a new design at revision 1, leaving the original alone', async () => {
    const { c } = await signUp(s.url, 'Dup Dora');
    const { id } = await createDesign(c, 'Original');
    await c.put(`/api/v1/designs/${id}`, { design: biggerTopload, revision: 1 });
    const r = await c.post(`/api/v1/designs/${id}/duplicate`);
    expect(r.status).toBe(201);
    const copy = await r.json();
    expect(copy).toMatchObject({ name: 'Original (copy)', revision: 1, role: 'owner', design: biggerTopload });
    expect((await (await c.get(`/api/v1/designs/${copy.id}/revisions`)).json()).revisions).toHaveLength(1);
    expect((await (await c.get(`/api/v1/designs/${id}`)).json()).revision).toBe(2);
    const bad = await c.post(`/api/v1/designs/${id}/duplicate`, { name: '' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.issues[0].path).toBe('name');
    expect((await (await c.get('/api/v1/designs')).json()).designs).toHaveLength(2);
  });

  it('PUT with only a new name keeps the design and adds a revision (rename)', async () => {
    const { c } = await signUp(s.url, 'Rename Rai');
    const { id } = await createDesign(c, 'Before');
    const r = await c.put(`/api/v1/designs/${id}`, { name: 'After', design: toroidCoil, revision: 1 });
    expect(r.status).toBe(200);
    const list = (await (await c.get('/api/v1/designs')).json()).designs;
    expect(list).toEqual([expect.objectContaining({ id, name: 'After', revision: 2, role: 'owner' })]);
  });
});
