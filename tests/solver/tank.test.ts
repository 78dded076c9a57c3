import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import {
  bankCapacitance,
  bankVoltageRating,
  capacitorEnergy,
  dischargeTimeConstant,
  ltrCapacitanceTransformer,
  peakVoltageRms,
  perUnitVoltage,
  powerAtBreakRate,
  resistorPower,
  resonantCapacitanceTransformer,
  sparkLengthFreau,
  transformerImpedance,
} from '../../src/solver';
import { evaluateSupply, evaluateTank } from '../../src/solver/tank/evaluate';

describe('resonantCapacitanceTransformer(V, I, f)', () => {
  it('gives 13.3 nF for a 6 kV / 30 mA transformer at 60 Hz (P. Lawrence, Tesla Coil Mailing List, June 2003)', () => {
    assertClose(resonantCapacitanceTransformer(6000, 0.03, 60), 13.3e-9, 0.005, '6 kV/30 mA');
  });
  it('gives about 10.6 nF for 15 kV / 60 mA at 60 Hz (C = I/(2π f V), common practice)', () => {
    assertClose(resonantCapacitanceTransformer(15000, 0.06, 60), 10.6e-9, 0.005, '15 kV/60 mA');
  });
  it('follows the rules nF ≈ 2.652 × mA/kV at 60 Hz and 3.183 × mA/kV at 50 Hz (C = I/(2π f V), common practice)', () => {
    assertClose(resonantCapacitanceTransformer(12000, 0.03, 60), (2.652 * 30) / 12 * 1e-9, 1e-3, '60 Hz rule');
    assertClose(resonantCapacitanceTransformer(12000, 0.03, 50), (3.183 * 30) / 12 * 1e-9, 1e-3, '50 Hz rule');
  });
});

describe('ltrCapacitanceTransformer(V, I, f)', () => {
  it('is π/2 ≈ 1.57 × the resonant value (1/(4fZ) against 1/(2πfZ); B. McGuyer, "Note 1: LTR", bartmcguyer.com)', () => {
    const ratio = ltrCapacitanceTransformer(12000, 0.03, 60) / resonantCapacitanceTransformer(12000, 0.03, 60);
    assertClose(ratio, Math.PI / 2, 1e-12, 'LTR ratio');
    assertClose(ratio, 1.57, 0.001, 'LTR ratio, as quoted');
  });
  it('equals 1/(240 Z) at 60 Hz (B. McGuyer, "Note 1: LTR", bartmcguyer.com)', () => {
    assertClose(ltrCapacitanceTransformer(12000, 0.03, 60), 1 / (240 * transformerImpedance(12000, 0.03)), 1e-12, '1/(240 Z)');
  });
});

describe('bankCapacitance / bankVoltageRating', () => {
  it('reproduce the hvtesla.com tray: 54 × 0.15 µF / 2000 V as 3 strings of 18 → 25 nF at 36 kV (hvtesla.com/mmc.html)', () => {
    assertClose(bankCapacitance(0.15e-6, 18, 3), 25e-9, 1e-12, 'tray capacitance');
    assertClose(bankVoltageRating(2000, 18), 36000, 1e-12, 'tray rating');
  });
  it('perUnitVoltage splits the peak evenly over the string', () => {
    assertClose(perUnitVoltage(16970, 20), 848.5, 1e-12, 'per unit');
  });
});

describe('capacitorEnergy(C, V) and powerAtBreakRate', () => {
  it('gives ½CV²: 20 nF at the peak of 12 kV RMS stores 2.88 J (closed form)', () => {
    assertClose(capacitorEnergy(20e-9, peakVoltageRms(12000)), 0.5 * 20e-9 * 2 * 12000 ** 2, 1e-12, '½CV²');
    assertClose(capacitorEnergy(20e-9, peakVoltageRms(12000)), 2.88, 1e-12, '2.88 J');
  });
  it('gives ½·BPS·C·V² (R. Burnett, richieburnett.co.uk/rotary.html): 2.88 J at 120 BPS → 345.6 W', () => {
    assertClose(powerAtBreakRate(2.88, 120), 345.6, 1e-12, 'throughput');
  });
});

describe('sparkLengthFreau(P)', () => {
  it('gives about 54 in at 1 kW (J. Freau, Tesla Coil Mailing List, 1998; common practice, single source)', () => {
    assertClose(sparkLengthFreau(1000) / 0.0254, 54, 0.005, 'inches at 1 kW');
  });
  it('grows as the square root of power', () => {
    assertClose(sparkLengthFreau(4000) / sparkLengthFreau(1000), 2, 1e-12, 'ratio');
  });
});

describe('resistorPower / dischargeTimeConstant', () => {
  it('give V²/R and RC (Ohm and Joule; 10 MΩ per unit: T. Fritz, Tesla Coil Mailing List, February 2000; common practice)', () => {
    assertClose(resistorPower(1000, 10e6), 0.1, 1e-12, 'bleeder power');
    assertClose(dischargeTimeConstant(10e6, 0.1e-6), 1, 1e-12, 'RC');
  });
});

describe('evaluateTank / evaluateSupply', () => {
  const nst = { kind: 'transformer' as const, voltage: 12000, current: 0.03, lineFrequency: 60, breakRate: 120 };
  it('evaluateTank(bank) gives capacitance, rating, per-unit voltage, bleeders and the caution', () => {
    const t = evaluateTank({ kind: 'bank', unitCapacitance: 100e-9, unitVoltage: 2000, series: 20, parallel: 2 }, nst);
    assertClose(t.capacitance, 10e-9, 1e-12, 'C');
    expect(t.voltageRating).toBe(40000);
    assertClose(t.perUnitVoltage!, (Math.SQRT2 * 12000) / 20, 1e-12, 'per unit');
    assertClose(t.energyAtSupplyPeak!, 0.5 * 10e-9 * 2 * 12000 ** 2, 1e-12, 'energy');
    expect(t.bleeder?.count).toBe(40);
    assertClose(t.bleeder!.powerPerUnit, ((Math.SQRT2 * 12000) / 20) ** 2 / 10e6, 1e-12, 'bleeder power');
    expect(t.caution).toMatch(/can kill/);
  });
  it('evaluateTank(single) has no rating and no energy without a supply', () => {
    const t = evaluateTank({ kind: 'single', capacitance: 20e-9 }, null);
    expect(t.voltageRating).toBeNull();
    expect(t.energyAtSupplyPeak).toBeNull();
    expect(t.bleeder).toBeNull();
  });
  it('evaluateSupply(transformer) gives resonant and LTR values, throughput and a Freau estimate fed the smaller power', () => {
    const s = evaluateSupply(nst, 10e-9);
    assertClose(s.resonantCapacitance!, 0.03 / (2 * Math.PI * 60 * 12000), 1e-12, 'C_res');
    assertClose(s.peakVoltage, Math.SQRT2 * 12000, 1e-12, 'peak');
    assertClose(s.powerAtBreakRate!, 120 * 0.5 * 10e-9 * 2 * 12000 ** 2, 1e-12, 'throughput');
    // 172.8 W through the gap is below the 360 VA rating
    assertClose(s.sparkLengthPower!, 172.8, 1e-9, 'power fed to the rule');
    assertClose(s.sparkLengthEstimate!, 1.7 * Math.sqrt(172.8) * 0.0254, 1e-12, 'spark length');
    expect(s.caution).toMatch(/can kill/);
  });
  it('evaluateSupply(transformer) assumes two firings per line cycle without a break rate', () => {
    expect(evaluateSupply({ ...nst, breakRate: null }, 10e-9).breakRate).toBe(120);
  });
  const bridge = {
    kind: 'solid-state' as const,
    busVoltage: 340,
    topology: 'dual-resonant' as const,
    bridge: 'full' as const,
    onTime: 100e-6,
    repetitionRate: 200,
    switchPeakCurrent: null,
    currentLimit: null,
    busCapacitance: null,
    tuningRatio: 0.9,
    defaulted: [],
  };
  it('evaluateSupply(solid-state) has no resonant capacitance, no spark-length estimate and no ½CV² energy per firing', () => {
    const s = evaluateSupply(bridge, 100e-9);
    expect(s.resonantCapacitance).toBeNull();
    expect(s.sparkLengthEstimate).toBeNull();
    expect(s.energyPerBang).toBeNull();
    expect(s.peakVoltage).toBe(340);
  });
  it('evaluateTank with a solid-state supply gives no bus-charged energy, per-unit share, rating margin or bleeders', () => {
    const t = evaluateTank({ kind: 'bank', unitCapacitance: 150e-9, unitVoltage: 2000, series: 4, parallel: 2, unitRmsCurrent: null }, bridge);
    assertClose(t.capacitance, 75e-9, 1e-12, 'bank capacitance');
    expect(t.voltageRating).toBe(8000);
    expect(t.energyAtSupplyPeak).toBeNull();
    expect(t.perUnitVoltage).toBeNull();
    expect(t.ratingMargin).toBeNull();
    expect(t.bleeder).toBeNull();
    // the same bank on a transformer keeps its charged-bank figures
    const nstTank = evaluateTank({ kind: 'bank', unitCapacitance: 150e-9, unitVoltage: 2000, series: 4, parallel: 2 }, nst);
    expect(nstTank.bleeder).not.toBeNull();
    expect(nstTank.energyAtSupplyPeak).toBeGreaterThan(0);
  });
});
