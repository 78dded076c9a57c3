import { describe, expect, it } from 'vitest';
import { unit } from 'mathjs';
import { referenceCases } from '../../src/lib/validation/cases';
import { physicsCases } from '../../src/lib/validation/cases-physics';
import { assertClose } from '../helpers/assertClose';
import { defineCase, q } from '../../src/lib/validation/inputs';

describe('referenceCases', () => {
  it.each(referenceCases.map((c) => [c.id, c] as const))('%s agrees with its reference within tolerance', (_id, c) => {
    assertClose(c.compute(), c.reference, c.tolerance, `${c.id} (${c.quantity}, ${c.unit}) inputs ${JSON.stringify(c.inputs)}, source: ${c.source}`);
  });

  it('referenceCases has unique ids, a source for every case and at most 3 cases per quantity', () => {
    const ids = referenceCases.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of referenceCases) {
      expect(c.source.length).toBeGreaterThan(10);
      expect(c.tolerance).toBeGreaterThan(0);
      expect(c.tolerance).toBeLessThanOrEqual(0.1);
    }
    const perQuantity = new Map<string, number>();
    for (const c of physicsCases) perQuantity.set(c.quantity, (perQuantity.get(c.quantity) ?? 0) + 1);
    for (const [quantity, count] of perQuantity) expect(count, `${quantity} has ${count} cases`).toBeLessThanOrEqual(3);
  });

  it('physicsCases covers at least 25 cases over 8 quantities, 10 of them published tables or closed forms', () => {
    expect(physicsCases.length).toBeGreaterThanOrEqual(25);
    expect(new Set(physicsCases.map((c) => c.method)).size).toBeGreaterThanOrEqual(6);
    expect(new Set(physicsCases.map((c) => c.quantity)).size).toBeGreaterThanOrEqual(8);
    expect(physicsCases.filter((c) => c.kind === 'published-table' || c.kind === 'closed-form').length).toBeGreaterThanOrEqual(10);
  });
});

describe('defineCase', () => {
  it('q shows the value in its unit and hands compute the SI value (or the unit named by as)', () => {
    const cases: Array<[ReturnType<typeof q>, string, number]> = [
      [q(6.35, 'mm'), '6.35 mm', 0.00635],
      [q(1, 'mm²'), '1 mm²', 1e-6],
      [q(1, 'km'), '1 km', 1000],
      [q(2.5, 'ft'), '2.5 ft', 0.762],
      [q(30, 'deg'), '30 deg', Math.PI / 6],
      [q(0.15, 'uF'), '0.15 uF', 0.15e-6],
      [q(50, 'µH'), '50 µH', 50e-6],
      [q(100, 'kHz'), '100 kHz', 100e3],
      [q(12, 'kV', { note: 'RMS' }), '12 kV (RMS)', 12000],
      [q(20, '°C', { as: '°C' }), '20 °C', 20],
      [q(0.25, '1', { note: '1/4' }), '0.25 (1/4)', 0.25],
    ];
    for (const [got, shown, received] of cases) {
      expect(got.shown).toBe(shown);
      assertClose(got.received, received, 1e-14, `q → ${shown}`);
    }
  });

  it('defineCase hands compute exactly the inputs it shows, quantities in SI', () => {
    let seen: unknown;
    const c = defineCase({
      id: 'probe',
      quantity: 'probe',
      method: 'wire',
      source: 'a probe of defineCase itself',
      kind: 'closed-form',
      inputs: { turns: 12, radius: q(150, 'mm'), ground: 'none', highFrequency: false },
      reference: 1,
      unit: '1',
      tolerance: 1e-12,
      compute: (x) => {
        seen = x;
        return x.turns * x.radius;
      },
    });
    expect(c.inputs).toEqual({ turns: 12, radius: '150 mm', ground: 'none', highFrequency: false });
    assertClose(c.compute(), 1.8, 1e-12, 'probe compute');
    expect(seen).toEqual({ turns: 12, radius: 0.15, ground: 'none', highFrequency: false });
    expect(c.received).toEqual(seen);
  });

  it('every reference case shows one entry per input compute receives, plain values unchanged', () => {
    for (const c of referenceCases) {
      expect(Object.keys(c.inputs), c.id).toEqual(Object.keys(c.received));
      for (const [k, shown] of Object.entries(c.inputs)) {
        const received = c.received[k];
        if (typeof shown === 'string' && typeof received === 'number') {
          // a quantity: the shown text alone gives the received number, in SI or in its own unit (°C)
          const text = shown.replace(/\s*\(.*\)$/, '').replace(/µ/g, 'u').replace('²', '^2').replace('°C', 'degC');
          const u = /^[-\d.e]+$/.test(text) ? null : unit(text);
          const candidates = u ? [u.toSI().toNumber(), u.toNumber(u.formatUnits())] : [Number(text)];
          const nearest = candidates.reduce((a, b) => (Math.abs(b - received) < Math.abs(a - received) ? b : a));
          assertClose(nearest, received, 1e-12, `${c.id}.${k}: shown ${shown}, received ${received}`);
        } else expect(received, `${c.id}.${k}`).toBe(shown);
      }
    }
  });
});
