import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { exampleDesigns, parseDesign, type DesignInput } from '../../src/lib/design';
import {
  C_0,
  insulatedDiameter,
  awgDiameter,
  inductanceSolenoidRoundWire,
  resonantFrequencyLC,
  selfCapacitanceMedhurst,
  solve,
  toploadCapacitance,
  type DesignSI,
  type Result,
} from '../../src/solver';

function si(input: DesignInput): DesignSI {
  const r = parseDesign(input);
  if (!r.ok) throw new Error(r.issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  return r.design;
}

const medium = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
const codes = (r: Result) => r.warnings.map((w) => w.code);

describe('solve(design) result shape', () => {
  it('has exactly the result sections and keys of the public API', () => {
    const r = solve(si(medium));
    for (const key of ['secondary', 'topload', 'system', 'primary', 'coupling', 'tuning', 'tank', 'supply', 'warnings']) {
      expect(r).toHaveProperty(key);
    }
    expect(Object.keys(r.secondary!)).toEqual(
      expect.arrayContaining(['inductance', 'selfCapacitance', 'resonantFrequency', 'wireLength', 'windingLength', 'aspectRatio', 'dcResistance', 'wireMass']),
    );
    expect(Object.keys(r.topload!)).toEqual(expect.arrayContaining(['capacitance']));
    expect(Object.keys(r.system!)).toEqual(expect.arrayContaining(['resonantFrequency', 'quarterWaveFrequency']));
    expect(Object.keys(r.primary!)).toEqual(expect.arrayContaining(['inductance', 'conductorLength']));
    expect(Object.keys(r.coupling!)).toEqual(expect.arrayContaining(['mutualInductance', 'k']));
    expect(Object.keys(r.tuning!)).toEqual(expect.arrayContaining(['targetFrequency', 'tapTurns', 'inRange']));
    expect(Object.keys(r.tank!)).toEqual(expect.arrayContaining(['capacitance', 'voltageRating', 'energyAtSupplyPeak']));
    expect(Object.keys(r.supply!)).toEqual(expect.arrayContaining(['resonantCapacitance']));
    for (const w of r.warnings) expect(Object.keys(w).sort()).toEqual(['code', 'message', 'path']);
  });

  it('sets each section to null when its input is absent', () => {
    const r = solve(si({ secondary: medium.secondary }));
    expect(r.secondary).not.toBeNull();
    expect(r.system).not.toBeNull();
    for (const k of ['topload', 'primary', 'coupling', 'tuning', 'tank', 'supply', 'response'] as const) expect(r[k], k).toBeNull();
  });

  it('survives a JSON round trip unchanged (no NaN, no Infinity, no undefined)', () => {
    const r = solve(si(medium));
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });
});

describe('solve(design) datums', () => {
  const d = si(medium);
  const r = solve(d);
  const ins = insulatedDiameter(awgDiameter(24), 'heavy');

  it('puts the current sheet at the wire centres: winding diameter = form + insulated diameter', () => {
    assertClose(r.secondary!.windingDiameter, 0.1143 + ins, 1e-12, 'winding diameter');
  });
  it('winds close-wound by default: windingLength = turns × insulated diameter; aspect = length / winding diameter', () => {
    assertClose(r.secondary!.windingLength, 1000 * ins, 1e-12, 'winding length');
    assertClose(r.secondary!.aspectRatio, (1000 * ins) / (0.1143 + ins), 1e-12, 'aspect');
  });
  it('puts the topload centre at groundClearance + secondary.elevation + windingLength + topload.elevation', () => {
    const h = 0.6 + 0.0254 + 1000 * ins + 3 * 0.0254;
    assertClose(r.topload!.centreHeightAboveGround, h, 1e-12, 'height');
    assertClose(
      r.topload!.capacitance,
      toploadCapacitance({ shape: 'toroid', majorDiameter: 20 * 0.0254, minorDiameter: 5 * 0.0254, centreHeightAboveGround: h }),
      1e-12,
      'C_top',
    );
  });
  it('keeps the lumped estimate (self-capacitance + topload alone) for comparison; the field model sets the loaded frequency', () => {
    const L = inductanceSolenoidRoundWire(1000, (0.1143 + ins) / 2, 1000 * ins, awgDiameter(24));
    const cs = selfCapacitanceMedhurst(0.1143 + ins, 1000 * ins).capacitance;
    assertClose(r.secondary!.inductance, L, 1e-12, 'L');
    // unloaded: the field model's winding alone, within Medhurst-versus-field spread of the lumped value
    assertClose(r.secondary!.resonantFrequency, resonantFrequencyLC(L, cs), 0.15, 'unloaded');
    assertClose(r.system!.lumpedResonantFrequency, resonantFrequencyLC(L, cs + r.topload!.capacitance), 1e-12, 'lumped');
    assertClose(r.system!.resonantFrequency, r.system!.modes[0], 1e-15, 'loaded = first mode');
    assertClose(r.system!.resonantFrequency, resonantFrequencyLC(r.system!.effectiveInductance, r.system!.effectiveCapacitance), 1e-12, 'effective pair');
    // the coil and the topload shield each other: the field model's frequency lies above the lumped one
    expect(r.system!.resonantFrequency).toBeGreaterThan(1.05 * r.system!.lumpedResonantFrequency);
    expect(r.system!.fieldCapacitance.interaction).toBeLessThan(0);
    expect(r.tuning!.targetFrequency).toBeLessThan(r.system!.resonantFrequency);
  });
  it('gives the quarter-wave comparison c/(4 · wire length)', () => {
    assertClose(r.system!.quarterWaveFrequency, C_0 / (4 * r.secondary!.wireLength), 1e-12, 'quarter wave');
  });
  it('tunes the tap so that the primary and tank resonate at the target', () => {
    expect(r.tuning!.inRange).toBe(true);
    const f = resonantFrequencyLC(r.primary!.inductanceAtTap!, r.tank!.capacitance);
    assertClose(f, r.tuning!.targetFrequency, 1e-8, 'primary at tap');
  });
  it('uses k at the tap for the split frequencies of the response', () => {
    const k = r.coupling!.kAtTap!;
    assertClose(r.response!.fLow, r.tuning!.targetFrequency / Math.sqrt(1 + k), 1e-6, 'f_lo');
    assertClose(r.response!.fHigh, r.tuning!.targetFrequency / Math.sqrt(1 - k), 1e-6, 'f_hi');
  });
});

describe('solve(design) against trade figures', () => {
  it('reproduces the 4 in × 20 in, 740-turn #22 coil: L ≈ 10 mH, C_self ≈ 8.2 pF, f ≈ 1.7 × quarter-wave (Wheeler 1928, Medhurst 1947; P. Nicholson, Tesla Coil Mailing List, December 2009)', () => {
    // The coil: Tesla Coil Mailing List, June 1997 (pupman.com archive). References by hand from published
    // formulas: H. A. Wheeler, Proc. IRE 16(10), 1928 (from memory): 2²·740²/(9·2 + 10·20) µH = 10.05 mH;
    // R. G. Medhurst, Wireless Engineer 24, 1947, table H(ℓ/D = 5) = 0.81 pF/cm × 10.16 cm = 8.2 pF.
    // 740 turns over 20 in: pitch 0.686 mm over 0.644 mm bare 22 AWG
    const r = solve(si({ secondary: { formDiameter: '4 in', turns: 740, wire: { diameter: awgDiameter(22), insulatedDiameter: 0.0006864 }, windingLength: '20 in' } }));
    assertClose(r.secondary!.inductance, 10e-3, 0.03, 'L');
    assertClose(r.secondary!.selfCapacitance, 8.2e-12, 0.05, 'C_self');
    const ratio = r.secondary!.resonantFrequency / r.system!.quarterWaveFrequency;
    expect(ratio).toBeGreaterThan(1.5);
    expect(ratio).toBeLessThan(2.0);
  });
});

describe('solve(design) warnings', () => {
  const sec = { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' as const } };
  it('aspect_ratio_low and aspect_ratio_high on secondary.windingLength (2.5–5 : 1, M. Rzeszotarski, Tesla Coil Mailing List, 1997)', () => {
    const low = solve(si({ secondary: { ...sec, formDiameter: '12 in', turns: 400 } }));
    expect(codes(low)).toContain('aspect_ratio_low');
    expect(low.warnings.find((w) => w.code === 'aspect_ratio_low')!.path).toBe('secondary.windingLength');
    const high = solve(si({ secondary: { ...sec, formDiameter: '2 in', turns: 1500 } }));
    expect(codes(high)).toContain('aspect_ratio_high');
    expect(codes(solve(si({ secondary: { ...sec, formDiameter: '4.5 in' } })))).not.toContain('aspect_ratio_high');
  });
  it('medhurst_out_of_range beyond the table', () => {
    expect(codes(solve(si({ secondary: { ...sec, formDiameter: '0.5 in', turns: 3000 } })))).toContain('medhurst_out_of_range');
  });
  it('topload_smaller_than_form', () => {
    const r = solve(si({ secondary: sec, topload: { shape: 'sphere', diameter: '3 in', elevation: '2 in' } }));
    expect(r.warnings.find((w) => w.code === 'topload_smaller_than_form')?.path).toBe('topload.diameter');
  });
  it('primary_inside_form when the inner turn sits under a raised secondary', () => {
    const r = solve(si({ secondary: { ...sec, elevation: '2 in' }, primary: { shape: 'flat', innerDiameter: '3 in', turns: 10, conductorDiameter: '0.25 in', spacing: '0.25 in' } }));
    expect(r.warnings.find((w) => w.code === 'primary_inside_form')?.path).toBe('primary.innerDiameter');
  });
  it('coupling_high_for_spark_gap above k = 0.2 (Stefan’s tech notes, hotstreamer.deanostoybox.com), not for the same coil on solid state', () => {
    const tight: DesignInput = {
      ...medium,
      secondary: { ...medium.secondary, elevation: '-4 in' },
      primary: { shape: 'helical', innerDiameter: '5.5 in', turns: 10, conductorDiameter: '0.25 in', spacing: '0.1 in' },
    };
    const r = solve(si(tight));
    expect(r.coupling!.k).toBeGreaterThan(0.2);
    expect(codes(r)).toContain('coupling_high_for_spark_gap');
    const ss = solve(si({ ...tight, supply: { kind: 'solid-state', busVoltage: '340 V' } }));
    if (ss.coupling!.k <= 0.3) expect(codes(ss)).not.toContain('coupling_high_for_solid_state');
    expect(codes(ss)).not.toContain('coupling_high_for_spark_gap');
  });
  it('tap_out_of_range with a null tap when the primary is too small', () => {
    const r = solve(si({ ...medium, tank: { capacitance: '2 nF' } }));
    expect(r.tuning!.tapTurns).toBeNull();
    expect(r.tuning!.inRange).toBe(false);
    expect(r.warnings.find((w) => w.code === 'tap_out_of_range')?.path).toBe('primary.turns');
    expect(r.response).toBeNull();
  });
  it('bank_rating_low below 2 × peak (common practice) and bank_rating_below_peak below the peak', () => {
    const low = solve(si({ ...medium, tank: { unitCapacitance: '100 nF', unitVoltage: '2 kV', series: 12, parallel: 1 } }));
    expect(codes(low)).toContain('bank_rating_low');
    const below = solve(si({ ...medium, tank: { unitCapacitance: '100 nF', unitVoltage: '2 kV', series: 8, parallel: 1 } }));
    expect(codes(below)).toContain('bank_rating_below_peak');
    expect(codes(solve(si(medium)))).not.toContain('bank_rating_low');
  });
  it('large_stored_energy above 1 J, stating the hazard', () => {
    const r = solve(si(medium));
    const w = r.warnings.find((x) => x.code === 'large_stored_energy')!;
    expect(w.message).toMatch(/can kill/);
    expect(w.message).toMatch(/bleeder/);
  });
  it('tank_near_resonant within 15 % of the transformer-resonant capacitance (C = I/(2π f V); common practice)', () => {
    const r = solve(si({ ...medium, tank: { capacitance: '6.8 nF' } }));
    expect(codes(r)).toContain('tank_near_resonant');
  });
  it('carries a spark-length estimate for transformer supplies only', () => {
    expect(solve(si(medium)).supply!.sparkLengthEstimate).toBeGreaterThan(0);
    const ss = exampleDesigns.find((e) => e.id === 'solid-state-helical')!.design;
    expect(solve(si(ss)).supply!.sparkLengthEstimate).toBeNull();
  });
});

describe('solve(design) with units or SI numbers', () => {
  it('gives identical results for "4.5 in" and 0.1143', () => {
    const a = solve(si(medium));
    const b = solve(
      si({
        ...medium,
        secondary: { ...medium.secondary, formDiameter: 0.1143, elevation: 0.0254 },
        groundClearance: 0.6,
        topload: { shape: 'toroid', majorDiameter: 0.508, minorDiameter: 0.127, elevation: 0.0762 },
        primary: { shape: 'flat', innerDiameter: 0.1651, turns: 16, conductorDiameter: 0.00635, spacing: 0.00635 },
        tank: { unitCapacitance: 100e-9, unitVoltage: 2000, series: 20, parallel: 2 },
        supply: { kind: 'transformer', voltage: 12000, current: 0.03, lineFrequency: 60, breakRate: 120 },
        tuning: { streamerCapacitance: 3e-12, targetCoupling: 0.1 },
      }),
    );
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
  });
});

describe('solve(design) for every example', () => {
  for (const ex of exampleDesigns) {
    it(`${ex.id}: finds a tap within the primary`, () => {
      const r = solve(si(ex.design));
      expect(r.tuning!.inRange).toBe(true);
      expect(r.tuning!.tapTurns!).toBeGreaterThan(0);
      expect(r.uncertainty!.tapTurns!.low!).toBeLessThan(r.tuning!.tapTurns!);
      expect(r.uncertainty!.tapTurns!.high!).toBeGreaterThan(r.tuning!.tapTurns!);
    });
  }
});
