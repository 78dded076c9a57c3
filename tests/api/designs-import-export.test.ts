import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import type { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { toroidCoil } from './designs-fixtures';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

async function count(c: Client) {
  return ((await (await c.get('/api/v1/designs')).json()).designs as unknown[]).length;
}

const file = (over: Record<string, unknown> = {}) => ({ format: 'coilwright-design', version: 1, name: 'Imported coil', design: toroidCoil, exportedAt: '2026-04-01T10:00:00.000Z', ...over });

describe('import and export', () => {
  it('GET /api/v1/designs/:id/export downloads the documented format as an attachment', async () => {
    const { c } = await signUp(s.url, 'Export Eli');
    const { id } = await createDesign(c, 'Fjordside coil / mk 2');
    const r = await c.get(`/api/v1/designs/${id}/export`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/^application\/json/);
    expect(r.headers.get('content-disposition')).toBe('attachment; filename="Fjordside-coil-mk-2.coilwright.json"');
    const body = await r.json();
    expect(Object.keys(body).sort()).toEqual(['design', 'exportedAt', 'format', 'name', 'version']);
    expect(body).toMatchObject({ format: 'coilwright-design', version: 1, name: 'Fjordside coil / mk 2', design: toroidCoil });
    expect(Number.isNaN(Date.parse(body.exportedAt))).toBe(false);
  });

  it('POST /api/v1/designs/import of an exported file makes an equal design at revision 1', async () => {
    const { c } = await signUp(s.url, 'Round Trip');
    const { id } = await createDesign(c, 'Round trip');
    const exported = await (await c.get(`/api/v1/designs/${id}/export`)).json();
    const r = await c.post('/api/v1/designs/import', exported);
    expect(r.status).toBe(201);
    const made = await r.json();
    expect(made).toMatchObject({ name: 'Round trip', revision: 1, role: 'owner', design: toroidCoil });
    const original = await (await c.get(`/api/v1/designs/${id}`)).json();
    const copy = await (await c.get(`/api/v1/designs/${made.id}`)).json();
    expect(copy.result.system.resonantFrequency).toBe(original.result.system.resonantFrequency);
    expect(await count(c)).toBe(2);
  });

  it('POST /api/v1/designs/import refuses malformed files with a message per field and creates nothing', async () => {
    const { c } = await signUp(s.url, 'Malformed Mo');
    await createDesign(c, 'Existing');
    const before = await count(c);
    const cases: Array<{ body: unknown; path: string }> = [
      { body: file({ format: 'something-else' }), path: 'format' },
      { body: file({ version: 2 }), path: 'version' },
      { body: file({ name: '' }), path: 'name' },
      { body: file({ design: undefined }), path: 'design' },
      { body: file({ design: { ...toroidCoil, secondary: { ...toroidCoil.secondary, turns: 'many' } } }), path: 'design.secondary.turns' },
      { body: file({ design: { ...toroidCoil, tank: { capacitance: '20 m' } } }), path: 'design.tank.capacitance' },
      { body: [1, 2, 3], path: '' },
    ];
    for (const { body, path } of cases) {
      const r = await c.post('/api/v1/designs/import', body);
      expect({ path, status: r.status }).toEqual({ path, status: 400 });
      const err = (await r.json()).error;
      expect(err.code).toBe('validation_failed');
      expect(err.message).toMatch(/nothing was created|JSON object/);
      expect(err.issues.map((i: { path: string }) => i.path)).toContain(path);
      for (const i of err.issues) expect(i.message.length).toBeGreaterThan(3);
    }
    const notJson = await c.post('/api/v1/designs/import', '{"format": "coilwright-design",');
    expect(notJson.status).toBe(400);
    expect((await notJson.json()).error.code).toBe('invalid_json');
    expect(await count(c)).toBe(before);
  });

  it('POST /api/v1/designs/import over 256 kB is 413 and creates nothing', async () => {
    const { c } = await signUp(s.url, 'Large Lu');
    const big = file({ padding: 'x'.repeat(300 * 1024) });
    const r = await c.post('/api/v1/designs/import', big);
    expect(r.status).toBe(413);
    expect((await r.json()).error.code).toBe('payload_too_large');
    expect(await count(c)).toBe(0);
  });

  it('import and export need sign-in; export of a design without a role is 404', async () => {
    const owner = await signUp(s.url, 'Owner Oli');
    const { id } = await createDesign(owner.c, 'Private coil 5521');
    const stranger = await signUp(s.url, 'Stranger Sia');
    const r = await stranger.c.get(`/api/v1/designs/${id}/export`);
    expect(r.status).toBe(404);
    expect(await r.text()).not.toContain('Private coil 5521');
    expect((await fetch(`${s.url}/api/v1/designs/import`, { method: 'POST', body: JSON.stringify(file()), headers: { 'content-type': 'application/json' } })).status).toBe(401);
  });
});
