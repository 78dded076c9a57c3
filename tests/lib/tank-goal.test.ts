import { describe, expect, it } from 'vitest';
import { proposeTank } from '../../src/lib/design/tank-goal';

const bank = { mode: 'bank' as const, unitCapacitance: 150e-9, unitVoltage: 2000, unitCapacitanceText: '150 nF', series: 10, parallel: 1 };

describe('the tank goal keeps the tank\'s form', () => {
  it('a bank gets strings and units that give the value, keeping its units and at least its series count', () => {
    const p = proposeTank(30e-9, bank);
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    // 150 nF units: 2 strings of 10 give exactly 30 nF
    expect(p.changes).toEqual([{ path: 'tank.parallel', label: 'Strings in parallel', from: '1', to: '2' }]);
    expect(p.achieved).toBeCloseTo(30e-9, 15);
    expect(p.message).toContain('Strings in parallel 1 → 2');
  });
  it('adds units per string when that comes nearer', () => {
    const p = proposeTank(12.5e-9, bank);
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    // 150/12 = 12.5 nF exactly
    expect(p.changes).toEqual([{ path: 'tank.series', label: 'Capacitors in each string', from: '10', to: '12' }]);
  });
  it('says it cannot when no strings of these units come within 5 %', () => {
    const p = proposeTank(4e-9, bank);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.message).toMatch(/cannot make 4 nF/);
  });
  it('refuses a value no tank can be, with the reason', () => {
    const p = proposeTank(1.439e-3, { mode: 'single', capacitance: '10 nF' });
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.message).toMatch(/outside what a tank can be \(between 1 pF and 1 mF\)/);
  });
  it('a single capacitor gets the value, saying what it was', () => {
    const p = proposeTank(22e-9, { mode: 'single', capacitance: '10 nF' });
    expect(p).toMatchObject({ ok: true, changes: [{ path: 'tank.capacitance', label: 'Tank capacitance', from: '10 nF', to: '22 nF' }] });
  });
});
