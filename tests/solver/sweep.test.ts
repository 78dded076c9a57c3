import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { exampleDesigns, parseDesign } from '../../src/lib/design';
import { solve, sweep, sweepablePaths, type DesignSI } from '../../src/solver';

function si(id: string): DesignSI {
  const r = parseDesign(exampleDesigns.find((e) => e.id === id)!.design);
  if (!r.ok) throw new Error('invalid example');
  return r.design;
}

describe('sweep(design, path, from, to, points)', () => {
  const d = si('sign-transformer-toroid');

  it('returns evenly spaced values and one entry per value in each default series', () => {
    const s = sweep(d, 'secondary.turns', 600, 1400, 200);
    expect(s.values.length).toBe(200);
    expect(s.values[0]).toBe(600);
    expect(s.values[199]).toBe(1400);
    for (const k of ['resonantFrequency', 'inductance', 'selfCapacitance', 'k'] as const) expect(s.series[k]!.length).toBe(200);
  });

  it('agrees with solve() at each point (topload within 1e-5, field-model ratio within 2e-4 between exact evaluations)', () => {
    const s = sweep(d, 'secondary.turns', 600, 1400, 41);
    for (const i of [0, 7, 20, 33, 40]) {
      const r = solve({ ...d, secondary: { ...d.secondary, turns: s.values[i] } });
      assertClose(s.series.inductance![i]!, r.secondary!.inductance, 1e-12, `L at N=${s.values[i]}`);
      assertClose(s.series.selfCapacitance![i]!, r.secondary!.selfCapacitance, 1e-12, `C at N=${s.values[i]}`);
      assertClose(s.series.resonantFrequency![i]!, r.system!.resonantFrequency, 2e-4, `f at N=${s.values[i]}`);
      assertClose(s.series.k![i]!, r.coupling!.k, 1e-12, `k at N=${s.values[i]}`);
    }
  });

  it('lowers the loaded frequency as turns are added', () => {
    const f = sweep(d, 'secondary.turns', 600, 1400, 50).series.resonantFrequency!;
    for (let i = 1; i < f.length; i++) expect(f[i]!).toBeLessThan(f[i - 1]!);
  });

  it('loosens the coupling as the secondary is raised (Stefan’s tech notes, hotstreamer.deanostoybox.com; common practice)', () => {
    const k = sweep(d, 'secondary.elevation', 0.02, 0.3, 30, ['k']).series.k!;
    for (let i = 1; i < k.length; i++) expect(k[i]!).toBeLessThan(k[i - 1]!);
  });

  it('gives tap positions that move out as the tank capacitance falls', () => {
    const t = sweep(d, 'tank.unitCapacitance', 110e-9, 90e-9, 5, ['tapTurns']).series.tapTurns!;
    for (let i = 1; i < t.length; i++) expect(t[i]!).toBeGreaterThan(t[i - 1]!);
  });

  it('marks designs that cannot be built as null, with their indices', () => {
    const fixed = { ...d, secondary: { ...d.secondary, windingLength: 0.6 } };
    const s = sweep(fixed, 'secondary.turns', 900, 1200, 31);
    // 0.6 m holds about 1064 turns of heavy 24 AWG
    expect(s.invalid.length).toBeGreaterThan(0);
    for (const i of s.invalid) expect(s.series.inductance![i]).toBeNull();
    expect(s.series.inductance![0]).not.toBeNull();
  });

  it('refuses a path that is not a numeric field, and unknown series', () => {
    expect(() => sweep(d, 'secondary.colour', 1, 2, 3)).toThrow(/not a numeric field/);
    expect(() => sweep(d, 'secondary.turns', 1, 2, 3, ['volume'])).toThrow(/unknown series/);
    expect(() => sweep(d, 'secondary.turns', 1, 2, 1)).toThrow(/points/);
  });

  it('lists the sweepable paths, including a close-wound winding length', () => {
    const paths = sweepablePaths(d);
    expect(paths).toContain('secondary.formDiameter');
    expect(paths).toContain('secondary.windingLength');
    expect(paths).toContain('primary.elevation');
    expect(paths).not.toContain('secondary.wire.awg');
  });
});
