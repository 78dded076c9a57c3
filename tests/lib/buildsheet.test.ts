import { describe, expect, it } from 'vitest';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { solve, copperMass, type DesignSI } from '~/solver';
import { buildSheet, calibratedTuning, mergeCalibration, readCalibration, sheetSections, suggestBank, suggestSpool, buildSheetQuerySchema } from '~/lib/buildsheet';
import { tapPosition } from '~/lib/buildsheet/format';
import { assertClose } from '../helpers/assertClose';


function example(id: string): DesignSI {
  const ex = exampleDesigns.find((e) => e.id === id)!;
  const parsed = parseDesign(ex.design);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design;
}

const INCH = 0.0254;

describe('buildSheet(design, result, options)', () => {
  const design = example('sign-transformer-toroid');
  const result = solve(design);
  const sheet = buildSheet(design, result, { rpm: 40, margin: 0.15, every: 150 });

  it('buildSheet takes the wire length and mass from the solver and adds the margin', () => {
    expect(sheet.secondary.wireLength).toBe(result.secondary!.wireLength);
    expect(sheet.secondary.wireMass).toBe(result.secondary!.wireMass);
    assertClose(sheet.secondary.wireToBuy, result.secondary!.wireLength * 1.15, 1e-12, 'wire to buy');
    // mass of the bought length, ρ·π d²/4·ℓ (copper 8890 kg/m³), is the solver's mass scaled by the same factor
    assertClose(sheet.secondary.massToBuy, result.secondary!.wireMass * 1.15, 1e-9, 'mass to buy');
    assertClose(sheet.secondary.massToBuy, copperMass(sheet.secondary.wireToBuy, design.secondary.wire.diameter), 1e-12, 'mass by formula');
  });

  it('buildSheet gives winding time = turns / rpm', () => {
    expect(sheet.secondary.windingTime).toBeCloseTo((1000 / 40) * 60, 9); // 25 min
  });

  it('buildSheet puts checkpoint n at n × pitch, pitch = winding length / turns', () => {
    const pitch = result.secondary!.windingLength / 1000;
    expect(sheet.secondary.checkpoints.map((c) => c.turns)).toEqual([150, 300, 450, 600, 750, 900, 1000]);
    for (const c of sheet.secondary.checkpoints) {
      assertClose(c.height, c.turns * pitch, 1e-12, `height at ${c.turns}`);
      assertClose(c.heightFromFormEnd, 1.5 * INCH + c.turns * pitch, 1e-12, `mark at ${c.turns}`);
    }
    expect(sheet.secondary.checkpoints.at(-1)!.height).toBe(result.secondary!.windingLength);
  });

  it('buildSheet cuts the form 3 in over the winding by default and never leaves less than 1 in each end', () => {
    assertClose(sheet.secondary.formLength, result.secondary!.windingLength + 3 * INCH, 1e-12, 'form length');
    const tight = buildSheet(design, result, { rpm: 40, margin: 0, every: 100, endMargin: 0.005 });
    assertClose(tight.secondary.formLength, result.secondary!.windingLength + 2 * INCH, 1e-12, 'minimum form length');
  });

  it('buildSheet reports turns per length as the inverse of the pitch', () => {
    assertClose(sheet.secondary.turnsPerMetre * sheet.secondary.pitch, 1, 1e-12, 'turns/m × pitch');
  });

  it('buildSheet lays out the bank with 10 MΩ bleeders dissipating V²/R', () => {
    const b = sheet.tank!.bank!;
    expect([b.series, b.parallel, b.units]).toEqual([20, 2, 40]);
    assertClose(b.capacitance, 10e-9, 1e-12, 'bank capacitance');
    const perUnit = (Math.SQRT2 * 12000) / 20; // 848.5 V
    assertClose(b.perUnitVoltage!, perUnit, 1e-12, 'per-unit voltage');
    assertClose(b.bleeder.power!, (perUnit * perUnit) / 10e6, 1e-12, 'bleeder power'); // 0.072 W
    expect(b.bleeder.withinRating).toBe(true);
    assertClose(b.ratingMargin!, 40000 / (Math.SQRT2 * 12000), 1e-12, 'rating margin');
  });

  it('buildSheet copies the primary lengths and tap from the solver', () => {
    expect(sheet.primary!.conductorLength).toBe(result.primary!.conductorLength);
    assertClose(sheet.primary!.conductorToBuy, result.primary!.conductorLength * 1.15, 1e-12, 'primary to buy');
    expect(sheet.primary!.tapTurns).toBe(result.tuning!.tapTurns);
    expect(sheet.primary!.calibrated).toBeNull();
  });

  it('buildSheet asks for four filter bypass capacitors above 9 kV and two at or below', () => {
    expect(sheet.supply!.filterBypassCapacitors).toBe(4);
    const small = example('bench-sphere');
    expect(buildSheet(small, solve(small), { rpm: 60, margin: 0.1, every: 100 }).supply!.filterBypassCapacitors).toBe(2);
  });

  it('sheetSections shows the wire to buy, the checkpoints and a safety checklist that defers to local codes', () => {
    const sections = sheetSections(sheet);
    const sec = sections.find((s) => s.id === 'secondary')!;
    expect(sec.rows.find((r) => r.label === 'Wire to buy')!.value).toBe(`${sheet.secondary.wireToBuy.toFixed(1)} m (${(sheet.secondary.wireToBuy / 0.3048).toFixed(0)} ft)`);
    expect(sections.find((s) => s.id === 'checkpoints')!.table!.rows).toHaveLength(7);
    expect(sections.find((s) => s.id === 'safety')!.list!.join(' ')).toMatch(/local electrical codes/i);
    expect(sections.find((s) => s.id === 'tank')!.caution).toBe('stored-energy');
  });
});

describe('suggestBank(capacitance, peak)', () => {
  it('suggestBank rates the string at 2 × the peak and comes near the capacitance', () => {
    // 6 kV RMS → 8485 V peak → 2 × = 16 971 V → 9 units of 2 kV; 6.8 nF × 9 / 150 nF = 0.41 → 1 string
    const b = suggestBank(6.8e-9, Math.SQRT2 * 6000);
    expect(b.series).toBe(9);
    expect(b.parallel).toBe(1);
    expect(b.suggested).toBe(true);
    expect(b.voltageRating).toBeGreaterThanOrEqual(2 * Math.SQRT2 * 6000);
  });
});

describe('suggestSpool(mass, unit)', () => {
  it('suggestSpool picks the smallest spool that holds the mass, or several of the largest', () => {
    expect(suggestSpool(0.3, 'kg')).toMatchObject({ count: 1, size: 0.5 });
    expect(suggestSpool(0.3, 'lb')).toMatchObject({ count: 1, size: 1 }); // 0.5 lb = 0.227 kg is too small
    expect(suggestSpool(23, 'kg')).toMatchObject({ count: 3, size: 10 });
  });
});

describe('calibratedTuning(design, result, calibration)', () => {
  const design = example('sign-transformer-toroid');
  const result = solve(design);

  it('calibratedTuning returns the predicted tap when the adopted frequency equals the prediction', () => {
    const c = calibratedTuning(design, result, { loadedFrequency: result.system!.resonantFrequency })!;
    assertClose(c.tapTurns!, result.tuning!.tapTurns!, 1e-6, 'tap');
  });

  it('calibratedTuning moves the tap in for a higher measured frequency and tunes the primary to it', () => {
    const measured = result.system!.resonantFrequency * 1.05;
    const c = calibratedTuning(design, result, { loadedFrequency: measured })!;
    expect(c.tapTurns!).toBeLessThan(result.tuning!.tapTurns!);
    // the primary at the new tap resonates with the tank at the streamer-lowered measured frequency
    const ratio = result.tuning!.targetFrequency / result.system!.resonantFrequency;
    assertClose(c.targetFrequency, measured * ratio, 1e-12, 'target');
    assertClose(1 / (2 * Math.PI * Math.sqrt(c.requiredInductance * c.tankCapacitance)), measured * ratio, 1e-9, 'LC frequency');
  });

  it('calibratedTuning is null when nothing that moves the tap was adopted', () => {
    expect(calibratedTuning(design, result, { coupling: 0.12 })).toBeNull();
  });

  it('mergeCalibration sets, clears and keeps; readCalibration drops junk', () => {
    expect(mergeCalibration({ loadedFrequency: 1e5, coupling: 0.1 }, { loadedFrequency: null, tankCapacitance: 2e-8 })).toEqual({ coupling: 0.1, tankCapacitance: 2e-8 });
    expect(readCalibration({ loadedFrequency: 'x', coupling: 0.2, tankCapacitance: -1 })).toEqual({ coupling: 0.2 });
    expect(readCalibration(null)).toEqual({});
  });
});

describe('buildSheetQuerySchema', () => {
  it('buildSheetQuerySchema applies defaults and names the bad parameter', () => {
    expect(buildSheetQuerySchema.parse({})).toEqual({ rpm: 60, margin: 0.1, every: 100 });
    const r = buildSheetQuerySchema.safeParse({ rpm: 'fast', margin: '-1', every: '2.5' });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join('.'));
    expect(paths.sort()).toEqual(['every', 'margin', 'rpm']);
  });
});

describe('tapPosition(turns)', () => {
  it('tapPosition splits whole turns and the angle around the next', () => {
    expect(tapPosition(7.375)).toBe('7 turns + 135°');
    expect(tapPosition(2.9999)).toBe('3 turns + 0°');
  });
});

describe('buildSheet for a bridge-driven coil', () => {
  const design = example('solid-state-helical');
  const result = solve(design);
  const sheet = buildSheet(design, result, { rpm: 40, margin: 0.15, every: 150 });
  const d = sheet.drive!;

  it('has no bleeders and no ½CV² of the bus; the bank is checked against the burst per capacitor', () => {
    expect(sheet.tank!.energyAtSupplyPeak).toBeNull();
    expect(sheet.tank!.bank!.perUnitVoltage).toBeNull();
    assertClose(d.bank!.unitPeakVoltage, result.drive!.capacitorPeakVoltage! / 4, 1e-12, 'per capacitor');
    assertClose(d.bank!.stringRmsCurrent, result.drive!.capacitorRmsCurrent! / 4, 1e-12, 'per string');
    assertClose(d.bank!.unitCapacitance, 150e-9, 1e-9, 'unit capacitance');
    const sections = sheetSections(sheet);
    const text = JSON.stringify(sections);
    expect(text).not.toMatch(/Bleeders/);
    expect(text).not.toMatch(/Stored energy at supply peak/);
    const drive = sections.find((x) => x.id === 'drive')!;
    expect(drive.caution).toBe('bus');
    expect(drive.table!.rows[0][0]).toBe('Peak voltage');
  });

  it('picks current-transformer ratios by the rule of thumb: ≤ 5 A out for feedback, about 0.5 A out at the trip', () => {
    // 600 A trip: 1:1000 gives 0.6 A, the first listed ratio at or below 0.5 A is 1:2000
    expect(d.tripCt.ratio).toBe(2000);
    assertClose(d.tripCt.outputAtTrip, 600 / 2000, 1e-12, 'trip output');
    expect(d.feedbackCt.outputPeak).toBeLessThanOrEqual(5);
    expect(d.feedbackCt.ratio).toBe(200); // about 510 A peak: 1:100 would give 5.1 A, 1:200 gives 2.6 A
  });

  it('states the bus capacitor, its energy and droop, and the primary conductor’s heat', () => {
    assertClose(d.bus.capacitance!, 3300e-6, 1e-9, 'bus capacitance');
    assertClose(d.bus.energy!, 0.5 * 3300e-6 * 340 ** 2, 1e-9, 'bus energy');
    assertClose(d.conductor.heat!, result.drive!.capacitorRmsCurrent! ** 2 * result.drive!.circuit.R1, 1e-12, 'I²R');
    // C·V·ΔV ≈ energy per burst at 5 % droop
    assertClose(d.bus.suggestedCapacitance * 340 * 0.05 * 340, result.drive!.burstEnergy, 1e-9, 'suggested bus capacitance');
  });
});
