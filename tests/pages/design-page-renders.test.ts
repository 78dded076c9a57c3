import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { createDesign, signUp } from '../helpers/accounts';
import { exampleDesigns } from '~/lib/design/examples';
import { addMember, verifiedUser } from '../api/designs-fixtures';

// The design page answers a repeat visit from its render cache; every input of the render is in the key,
// so each change below must show on the next visit.
let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

const design = exampleDesigns[1].design;
const props = (html: string) => html.replaceAll('&quot;', '"');

describe('GET /designs/:id after changes to what it shows', () => {
  it('shows the new name, revision, calibration and unit system on the next visit', async () => {
    const { c: owner } = await signUp(s.url, 'Render Owner');
    const { id } = await createDesign(owner, 'Quay coil', design);
    const page = async () => {
      const r = await owner.get(`/designs/${id}`);
      expect(r.status).toBe(200);
      return props(await r.text());
    };
    const first = await page();
    expect(first).toContain('Quay coil');
    expect(first).toContain('"unitSystem":[0,"metric"]');
    expect(await page()).toBe(first);

    expect((await owner.put(`/api/v1/designs/${id}`, { name: 'Quay coil, rewound', design: { ...design, secondary: { ...design.secondary, turns: 900 } }, revision: 1 })).status).toBe(200);
    const renamed = await page();
    expect(renamed).toContain('Quay coil, rewound');
    expect(renamed).toContain('"revision":[0,2]');
    expect(renamed).toContain('"turns":[0,900]');

    expect((await owner.put(`/api/v1/designs/${id}/calibration`, { loadedFrequency: 187654 })).status).toBe(200);
    expect(await page()).toContain('187654');

    expect((await owner.patch('/api/v1/me', { unitSystem: 'imperial' })).status).toBe(200);
    expect(await page()).toContain('"unitSystem":[0,"imperial"]');

  });

  it('renders each viewer their own header, and the review state once a review is asked for', async () => {
    const owner = (await verifiedUser(s.url, 'Header Owner')).c;
    const viewer = await verifiedUser(s.url, 'Header Viewer');
    const { id } = await createDesign(owner, 'Shared header coil', design);
    await addMember(s.url, owner, id, viewer, 'viewer');
    const mine = await (await owner.get(`/designs/${id}`)).text();
    const theirs = await (await viewer.c.get(`/designs/${id}`)).text();
    expect(mine).toContain('Header Owner');
    expect(theirs).toContain('Header Viewer');
    expect(theirs).not.toContain('Header Owner');

    const state = async () => (await (await owner.get(`/designs/${id}`)).text()).match(/data-review-state="([a-z_]+)"/)?.[1];
    expect(await state()).toBe('none');
    const asked = await owner.post(`/api/v1/designs/${id}/reviews`, { revision: 1, reviewerId: viewer.id });
    expect(asked.status, await asked.clone().text()).toBe(201);
    expect(await state()).toBe('requested');
  });
});
