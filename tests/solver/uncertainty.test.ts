import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { exampleDesigns, parseDesign, type DesignInput } from '../../src/lib/design';
import { evaluateUncertainty, solve, UNCERTAINTY_SOURCES, type DesignSI } from '../../src/solver';

function si(input: DesignInput): DesignSI {
  const r = parseDesign(input);
  if (!r.ok) throw new Error('invalid');
  return r.design;
}
const medium = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;

describe('evaluateUncertainty(design, base)', () => {
  it('moves a bare coil by −2.41 %/+2.60 % for Medhurst ±5 % (f ∝ C^−½; Medhurst 1947 accuracy)', () => {
    const r = solve(si({ secondary: medium.secondary }));
    const c = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'selfCapacitance')!;
    assertClose(c.relLow, 1 / Math.sqrt(1.05) - 1, 1e-9, 'low');
    assertClose(c.relHigh, 1 / Math.sqrt(0.95) - 1, 1e-9, 'high');
  });

  it('moves ±0.5 % inductance by f ∝ L^−½', () => {
    const r = solve(si({ secondary: medium.secondary }));
    const c = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'inductance')!;
    assertClose(c.relLow, 1 / Math.sqrt(1.005) - 1, 1e-9, 'low');
  });

  it('lists topload and streamer sources only when they are present', () => {
    const bare = solve(si({ secondary: medium.secondary })).uncertainty!.loadedFrequency.contributions.map((c) => c.source);
    expect(bare).toEqual(['selfCapacitance', 'inductance', 'formDiameter']);
    const full = solve(si(medium)).uncertainty!.loadedFrequency.contributions.map((c) => c.source);
    expect(full).toEqual(['selfCapacitance', 'inductance', 'toploadSurroundings', 'streamerAllowance', 'formDiameter']);
  });

  it('spans the streamer allowance from 0.8 to 2 pF per foot (T. Fritz, Tesla Coil Mailing List, 2005; Spark Discharge, CRC Press; common practice)', () => {
    const d = si(medium);
    const r = solve(d);
    const s = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'streamerAllowance')!;
    const L = r.secondary!.inductance;
    const C = r.system!.totalCapacitance;
    const f = (cx: number) => 1 / (2 * Math.PI * Math.sqrt(L * (C + cx)));
    assertClose(s.relLow, f(6e-12) / f(3e-12) - 1, 1e-9, 'at 2 pF/ft');
    assertClose(s.relHigh, f(2.4e-12) / f(3e-12) - 1, 1e-9, 'at 0.8 pF/ft');
  });

  it('combines the sources by root-sum-square on each side', () => {
    const u = solve(si(medium)).uncertainty!.loadedFrequency;
    const down = Math.sqrt(u.contributions.reduce((a, c) => a + c.relLow ** 2, 0));
    const up = Math.sqrt(u.contributions.reduce((a, c) => a + c.relHigh ** 2, 0));
    assertClose(u.low, u.nominal * (1 - down), 1e-12, 'low');
    assertClose(u.high, u.nominal * (1 + up), 1e-12, 'high');
    expect(u.low).toBeLessThan(u.nominal);
    expect(u.high).toBeGreaterThan(u.nominal);
  });

  it('widens with a looser form-diameter tolerance', () => {
    const d = si(medium);
    const r = solve(d);
    const base = {
      inductance: r.secondary!.inductance,
      selfCapacitance: r.secondary!.selfCapacitance,
      toploadCapacitance: r.topload!.capacitance,
      streamerCapacitance: 3e-12,
      tankCapacitance: r.tank!.capacitance,
    };
    const tight = evaluateUncertainty(d, base).loadedFrequency.contributions.find((c) => c.source === 'formDiameter')!;
    const loose = evaluateUncertainty(d, base, { formDiameterTolerance: 0.005 }).loadedFrequency.contributions.find((c) => c.source === 'formDiameter')!;
    expect(Math.abs(loose.relLow)).toBeGreaterThan(4 * Math.abs(tight.relLow));
    expect(UNCERTAINTY_SOURCES.formDiameter).toBe(0.001);
  });

  it('brackets the tap: more turns for the low end of the band, fewer for the high end', () => {
    const r = solve(si(medium));
    const t = r.uncertainty!.tapTurns!;
    expect(t.low!).toBeLessThan(r.tuning!.tapTurns!);
    expect(t.high!).toBeGreaterThan(r.tuning!.tapTurns!);
  });
});
