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
  it('lumped base: moves a bare coil by −2.41 %/+2.60 % for Medhurst ±5 % (f ∝ C^−½; Medhurst 1947 accuracy)', () => {
    const d = si({ secondary: medium.secondary });
    const r = solve(d);
    const u = evaluateUncertainty(d, {
      inductance: r.secondary!.inductance,
      selfCapacitance: r.secondary!.selfCapacitance,
      toploadCapacitance: 0,
      streamerCapacitance: 0,
      tankCapacitance: null,
    });
    const c = u.loadedFrequency.contributions.find((x) => x.source === 'selfCapacitance')!;
    assertClose(c.relLow, 1 / Math.sqrt(1.05) - 1, 1e-9, 'low');
    assertClose(c.relHigh, 1 / Math.sqrt(0.95) - 1, 1e-9, 'high');
    assertClose(u.loadedFrequency.nominal, r.system!.lumpedResonantFrequency, 1e-12, 'lumped nominal');
  });

  it('field model: moves a bare coil by −0.99 %/+1.02 % for ±2 % on the effective capacitance (its stated accuracy)', () => {
    const r = solve(si({ secondary: medium.secondary }));
    const c = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'fieldModel')!;
    assertClose(c.relLow, 1 / Math.sqrt(1.02) - 1, 1e-9, 'low');
    assertClose(c.relHigh, 1 / Math.sqrt(0.98) - 1, 1e-9, 'high');
    assertClose(r.uncertainty!.loadedFrequency.nominal, r.system!.resonantFrequency, 1e-12, 'nominal is the field model');
  });

  it('centres the band on the tuning target (streamer allowance included) and always contains it', () => {
    for (const ex of exampleDesigns) {
      const r = solve(si(ex.design));
      const u = r.uncertainty!.loadedFrequency;
      assertClose(u.nominal, r.tuning?.targetFrequency ?? r.system!.resonantFrequency, 1e-12, ex.id);
      expect(u.low).toBeLessThan(u.nominal);
      expect(u.high).toBeGreaterThan(u.nominal);
    }
  });

  it('moves ±0.5 % inductance by f ∝ L^−½', () => {
    const r = solve(si({ secondary: medium.secondary }));
    const c = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'inductance')!;
    assertClose(c.relLow, 1 / Math.sqrt(1.005) - 1, 1e-9, 'low');
  });

  it('lists topload and streamer sources only when they are present', () => {
    const bare = solve(si({ secondary: medium.secondary })).uncertainty!.loadedFrequency.contributions.map((c) => c.source);
    expect(bare).toEqual(['fieldModel', 'windingCapacitance', 'inductance', 'formDiameter']);
    const full = solve(si(medium)).uncertainty!.loadedFrequency.contributions.map((c) => c.source);
    expect(full).toEqual(['fieldModel', 'windingCapacitance', 'inductance', 'toploadSurroundings', 'streamerAllowance', 'formDiameter']);
  });

  it('spans the streamer allowance from 0.8 to 2 pF per foot (T. Fritz, Tesla Coil Mailing List, 2005; Spark Discharge, CRC Press; common practice)', () => {
    const d = si(medium);
    const r = solve(d);
    const s = r.uncertainty!.loadedFrequency.contributions.find((x) => x.source === 'streamerAllowance')!;
    // the field model re-solved with the allowance at each end of its range
    const f = (cx: number) => solve({ ...d, tuning: { ...d.tuning, streamerCapacitance: cx } }).tuning!.targetFrequency;
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
