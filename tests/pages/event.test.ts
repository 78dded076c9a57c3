import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { formatLengthBoth } from '~/lib/format';
import { PERIMETER_MARGIN } from '~/lib/event/perimeter';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

const sparkGapCoil = {
  secondary: { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' } },
  topload: { shape: 'toroid', majorDiameter: '20 in', minorDiameter: '5 in', elevation: '3 in' },
  primary: { shape: 'flat', innerDiameter: '6 in', turns: 12, conductorDiameter: '0.25 in', spacing: '0.25 in' },
  tank: { capacitance: '20 nF' },
  supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA', lineFrequency: '60 Hz' },
};

const solidStateCoil = {
  ...sparkGapCoil,
  supply: { kind: 'solid-state', busVoltage: '340 V' },
};

describe('GET /designs/:id/event', () => {
  it('GET /designs/:id/event draws the perimeter from the spark-length estimate plus 10 ft for the owner', async () => {
    const owner = (await signUp(s.url, 'Event Owner')).c;
    const { id } = await createDesign(owner, 'Open-day coil', sparkGapCoil);
    const detail = (await (await owner.get(`/api/v1/designs/${id}`)).json()) as {
      result: { supply: { sparkLengthEstimate: number } };
    };
    const estimate = detail.result.supply.sparkLengthEstimate;
    expect(estimate).toBeGreaterThan(0);

    const r = await owner.get(`/designs/${id}/event`);
    expect(r.status).toBe(200);
    const html = await r.text();
    const expected = 0.254 + estimate + PERIMETER_MARGIN; // 20 in outside diameter → 0.254 m radius
    expect(html).toContain(formatLengthBoth(expected, 'metric', 3));
    expect(html).toContain('Freau');
    expect(html).toMatch(/10 ft beyond the longest arc/);
    expect(html).toMatch(/Venue rules, insurers and local electrical codes come first/);
    for (const anchor of ['#audience', '#supply', '#ozone', '#noise', '#implants', '#interference', '#fire', '#stored-energy']) {
      expect(html).toContain(`/safety${anchor}`);
    }
    expect(html).toMatch(/@media print/);
    expect(html).not.toMatch(/<script\b/i);
  });

  it('GET /designs/:id/event for a stranger is 404 and shows nothing of the design', async () => {
    const owner = (await signUp(s.url, 'Private Owner')).c;
    const { id } = await createDesign(owner, 'Secret workshop coil', sparkGapCoil);

    const stranger = (await signUp(s.url, 'Stranger')).c;
    const r = await stranger.get(`/designs/${id}/event`);
    expect(r.status).toBe(404);
    expect(await r.text()).not.toContain('Secret workshop coil');

    const missing = await stranger.get('/designs/does-not-exist/event');
    expect(missing.status).toBe(404);
  });

  it('GET /designs/:id/event without a session redirects to sign-in', async () => {
    const r = await new Client(s.url).get('/designs/anything/event');
    expect(r.status).toBe(302);
    expect(r.headers.get('location')).toMatch(/^\/sign-in\?next=%2Fdesigns%2Fanything%2Fevent/);
  });

  it('GET /designs/:id/event for a solid-state coil asks for a spark length and uses a stated one', async () => {
    const owner = (await signUp(s.url, 'Solid Owner')).c;
    const { id } = await createDesign(owner, 'Solid-state coil', solidStateCoil);

    const ask = await (await owner.get(`/designs/${id}/event`)).text();
    expect(ask).toContain('data-testid="perimeter-missing"');
    expect(ask).toContain('?spark=1.2 m');
    expect(ask).not.toContain('data-testid="perimeter-radius"');

    const stated = await owner.get(`/designs/${id}/event?spark=${encodeURIComponent('1.2 m')}`);
    expect(stated.status).toBe(200);
    const html = await stated.text();
    expect(html).toContain(formatLengthBoth(0.254 + 1.2 + PERIMETER_MARGIN, 'metric', 3));
    expect(html).toContain('assumes the stated spark length');
    // the sheet of a bridge-driven coil: the bus and its lethal charge, its own checklist, no bleeders or spark gap
    expect(html).toContain('data-testid="bus-voltage"');
    expect(html).toContain('data-testid="tank-peak-voltage"');
    expect(html).toContain('optical fibre');
    expect(html).toContain('Bus capacitors discharged');
    expect(html).not.toContain('fitted with bleeders');
    expect(html).not.toContain('Spark gap enclosed');
    expect(html).not.toContain('data-testid="tank-energy"');
  });

  it('GET /designs/:id/event?spark=bad answers 400 with a message naming the field', async () => {
    const owner = (await signUp(s.url, 'Typo Owner')).c;
    const { id } = await createDesign(owner, 'Typo coil', sparkGapCoil);
    const r = await owner.get(`/designs/${id}/event?spark=${encodeURIComponent('3 kg')}`);
    expect(r.status).toBe(400);
    const html = await r.text();
    expect(html).toContain('data-testid="spark-error"');
    expect(html).toMatch(/Longest arc: give the longest arc as a length/);
    expect(html).not.toMatch(/NaN|Infinity/);
  });
});
