import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { exampleDesigns, parseDesign } from '../../src/lib/design';
import {
  elevationForCoupling,
  solve,
  tankCapacitanceForTap,
  turnsForFrequency,
  windingLengthForFrequency,
  type DesignSI,
} from '../../src/solver';

function si(id: string): DesignSI {
  const r = parseDesign(exampleDesigns.find((e) => e.id === id)!.design);
  if (!r.ok) throw new Error('invalid example');
  return r.design;
}

describe('turnsForFrequency(design, f)', () => {
  it('close-wound: the turns it returns put the loaded frequency at the target within 0.1 %', () => {
    const d = si('sign-transformer-toroid');
    const got = turnsForFrequency(d, 160e3)!;
    const r = solve({ ...d, secondary: { ...d.secondary, turns: got.turns } });
    assertClose(r.tuning!.targetFrequency, 160e3, 1e-3, `N=${got.turns}`);
    assertClose(r.secondary!.windingLength, got.windingLength, 1e-12, 'winding length follows');
  });
  it('fixed winding length: the length stays, the turns change', () => {
    const d = si('bench-sphere');
    const fixed = { ...d, secondary: { ...d.secondary, windingLength: 0.4 } };
    const got = turnsForFrequency(fixed, 450e3)!;
    expect(got.windingLength).toBe(0.4);
    const r = solve({ ...fixed, secondary: { ...fixed.secondary, turns: got.turns } });
    assertClose(r.tuning!.targetFrequency, 450e3, 1e-3, `N=${got.turns}`);
  });
  it('returns null for a target no turn count reaches', () => {
    expect(turnsForFrequency(si('bench-sphere'), 1e9)).toBeNull();
  });
});

describe('windingLengthForFrequency(design, f)', () => {
  it('the length it returns puts the loaded frequency at the target within 0.1 %', () => {
    const d = si('bench-sphere');
    const now = solve(d).tuning!.targetFrequency;
    const len = windingLengthForFrequency(d, now * 1.05)!;
    const r = solve({ ...d, secondary: { ...d.secondary, windingLength: len } });
    assertClose(r.tuning!.targetFrequency, now * 1.05, 1e-3, `length ${len}`);
  });
});

describe('tankCapacitanceForTap(design, tap)', () => {
  it('the capacitance it returns puts the solved tap at the requested one within 0.1 %', () => {
    const d = si('sign-transformer-toroid');
    const C = tankCapacitanceForTap(d, 13.5)!;
    const r = solve({ ...d, tank: { kind: 'single', capacitance: C } });
    assertClose(r.tuning!.tapTurns!, 13.5, 1e-3, `C=${C}`);
  });
  it('is null without a primary', () => {
    expect(tankCapacitanceForTap({ ...si('bench-sphere'), primary: null }, 3)).toBeNull();
  });
});

describe('elevationForCoupling(design, k)', () => {
  for (const id of ['sign-transformer-toroid', 'solid-state-helical', 'bench-sphere']) {
    it(`${id}: the elevation it returns gives the target k within 0.1 %`, () => {
      const d = si(id);
      const target = 0.9 * solve(d).coupling!.k;
      const e = elevationForCoupling(d, target)!;
      const r = solve({ ...d, secondary: { ...d.secondary, elevation: e } });
      assertClose(r.coupling!.k, target, 1e-3, `elevation ${e}`);
      expect(e).toBeGreaterThan(d.secondary.elevation);
    });
  }
  it('returns null for a coupling no elevation reaches', () => {
    expect(elevationForCoupling(si('sign-transformer-toroid'), 0.8)).toBeNull();
  });
  it('is reported by solve() for tuning.targetCoupling', () => {
    const d = si('sign-transformer-toroid');
    const r = solve(d);
    const check = solve({ ...d, secondary: { ...d.secondary, elevation: r.coupling!.elevationForTargetCoupling! } });
    expect(r.coupling!.elevationForTargetCoupling!).toBeGreaterThan(d.secondary.elevation);
    assertClose(check.coupling!.k, d.tuning.targetCoupling!, 1e-3, 'k at reported elevation');
  });
});
