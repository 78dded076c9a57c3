import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { exampleDesigns } from '../../src/lib/design/examples';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});

const medium = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;

async function solve(body: string | object) {
  const r = await fetch(`${s.url}/api/v1/solve`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
  return { status: r.status, body: await r.json() };
}

const bridgeCoil = exampleDesigns.find((e) => e.id === 'solid-state-helical')!.design;

describe('POST /api/v1/solve with a solid-state supply', () => {
  it('returns the drive section: the burst at the tap, tuned to the ratio, with the bank checked', async () => {
    const { status, body } = await solve(bridgeCoil);
    expect(status).toBe(200);
    expect(body.drive.topology).toBe('dual-resonant');
    expect(Math.abs(body.drive.primaryFrequency / (0.9 * body.tuning.targetFrequency) - 1)).toBeLessThan(1e-3);
    expect(body.drive.peakPrimaryCurrent).toBeGreaterThan(0);
    expect(body.drive.capacitorPeakVoltage).toBeGreaterThan(body.drive.busVoltage);
    expect(body.drive.waveform.time.length).toBe(body.drive.waveform.primaryCurrent.length);
    expect(body.drive.bank.series).toBe(4);
    expect(body.supply.energyPerBang).toBeNull();
    expect(body.tank.bleeder).toBeNull();
  });
  it('a transformer design answers drive: null', async () => {
    const { body } = await solve(medium);
    expect(body.drive).toBeNull();
  });
  it('refuses bad drive fields with 400, naming the field', async () => {
    for (const [patch, path] of [
      [{ onTime: '150 kg' }, 'supply.onTime'],
      [{ topology: 'triple-resonant' }, 'supply.topology'],
      [{ repetitionRate: -5 }, 'supply.repetitionRate'],
      [{ currentLimit: '450 V' }, 'supply.currentLimit'],
    ] as const) {
      const { status, body } = await solve({ ...bridgeCoil, supply: { ...bridgeCoil.supply, ...patch } });
      expect(status, path).toBe(400);
      expect(body.error.code).toBe('validation_failed');
      expect(body.error.issues.map((i: { path: string }) => i.path), path).toContain(path);
    }
  });
});

describe('POST /api/v1/solve', () => {
  it('answers a valid design without sign-in with every section of the result', async () => {
    const { status, body } = await solve(medium);
    expect(status).toBe(200);
    for (const k of ['secondary', 'topload', 'system', 'primary', 'coupling', 'tuning', 'tank', 'supply', 'warnings']) expect(body).toHaveProperty(k);
    expect(body.system.resonantFrequency).toBeGreaterThan(1e4);
    expect(body.tuning.inRange).toBe(true);
  });

  it('a design with only a secondary gives null sections for the absent parts', async () => {
    const { status, body } = await solve({ secondary: { formDiameter: '4 in', turns: 900, wire: { awg: 24, insulation: 'heavy' } } });
    expect(status).toBe(200);
    expect(body.topload).toBeNull();
    expect(body.primary).toBeNull();
    expect(body.system.resonantFrequency).toBeCloseTo(body.secondary.resonantFrequency, 6);
  });

  const bad: Array<[string, unknown, string]> = [
    ['missing secondary', { topload: null }, 'secondary'],
    ['wrong dimension', { ...medium, secondary: { ...medium.secondary, formDiameter: '3 kg' } }, 'secondary.formDiameter'],
    ['negative value', { ...medium, secondary: { ...medium.secondary, formDiameter: -0.1 } }, 'secondary.formDiameter'],
    ['zero turns', { ...medium, secondary: { ...medium.secondary, turns: 0 } }, 'secondary.turns'],
    ['non-finite (string "Infinity")', { ...medium, tank: { capacitance: 'Infinity' } }, 'tank.capacitance'],
    ['out of range', { ...medium, secondary: { ...medium.secondary, turns: 1e9 } }, 'secondary.turns'],
    ['unknown unit', { ...medium, supply: { ...medium.supply, voltage: '12 blorps' } }, 'supply.voltage'],
    ['turns that do not fit the winding', { ...medium, secondary: { ...medium.secondary, windingLength: '2 in' } }, 'secondary.windingLength'],
    ['a helical primary running through the winding', { ...medium, primary: { ...medium.primary, shape: 'helical', innerDiameter: '2 in', elevation: '3 in' } }, 'primary.innerDiameter'],
  ];
  for (const [what, design, path] of bad) {
    it(`answers 400 naming ${path} for ${what}`, async () => {
      const { status, body } = await solve(design as object);
      expect(status).toBe(400);
      expect(body.error.code).toBe('validation_failed');
      expect(body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
      for (const i of body.error.issues) expect(i.message.length).toBeGreaterThan(5);
    });
  }

  it('warns, beside primary.innerDiameter, of a flat primary whose inner turn lies inside the form below the winding', async () => {
    const { status, body } = await solve({ ...medium, primary: { ...medium.primary, innerDiameter: '2 in' } });
    expect(status).toBe(200);
    expect(body.warnings.map((w: { path: string }) => w.path)).toContain('primary.innerDiameter');
  });

  it('answers 400 invalid_json for a body that is not JSON, never a 500', async () => {
    const { status, body } = await solve('{"secondary": ');
    expect(status).toBe(400);
    expect(body.error.code).toBe('invalid_json');
    expect(JSON.stringify(body)).not.toMatch(/at .*\.js:\d+/);
  });
});

describe('GET /api/v1/openapi.json', () => {
  it('documents the contract routes and the design schema from the same zod schemas', async () => {
    const r = await fetch(`${s.url}/api/v1/openapi.json`);
    expect(r.status).toBe(200);
    const doc = await r.json();
    expect(doc.openapi).toMatch(/^3\./);
    for (const p of ['/api/v1/solve', '/api/v1/designs', '/api/v1/designs/{id}', '/api/v1/designs/{id}/revisions', '/api/v1/designs/{id}/share', '/api/v1/shared/{token}']) {
      expect(doc.paths).toHaveProperty([p]);
    }
    expect(doc.components.schemas.Design.properties.secondary).toBeTruthy();
    expect(doc.components.schemas.Design.required).toContain('secondary');
  });
});
