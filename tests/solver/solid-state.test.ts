import { describe, expect, it } from 'vitest';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { onTimeForTargetPeak, solve, tankForTargetPeak, tapForTuningRatio, type DesignSI } from '~/solver';
import { assertClose } from '../helpers/assertClose';

function si(input: unknown): DesignSI {
  const p = parseDesign(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.design;
}

const demo = exampleDesigns.find((e) => e.id === 'solid-state-helical')!.design;
const { supply: _s, ...rest } = demo;
/** The demo coil as a design saved before the drive fields existed: a solid-state supply with only its bus voltage. */
const old = { ...rest, supply: { kind: 'solid-state', busVoltage: '340 V' } };

describe('a solid-state supply saved with only its bus voltage', () => {
  it('still opens: the missing drive fields take the stated defaults, listed as defaulted', () => {
    const d = si(old);
    const u = d.supply!;
    expect(u.kind).toBe('solid-state');
    if (u.kind !== 'solid-state') return;
    expect(u).toMatchObject({ topology: 'dual-resonant', bridge: 'full', onTime: 100e-6, repetitionRate: 200, tuningRatio: 0.9, currentLimit: null, switchPeakCurrent: null, busCapacitance: null });
    expect(u.defaulted.sort()).toEqual(['bridge', 'onTime', 'repetitionRate', 'topology', 'tuningRatio']);
  });
  it('gets a warning naming the assumed fields and their values, and a drive section', () => {
    const r = solve(si(old));
    const w = r.warnings.find((x) => x.code === 'drive_defaults_assumed');
    expect(w?.path).toBe('supply');
    expect(w?.message).toMatch(/on-time/);
    expect(w?.message).toMatch(/100 µs/);
    expect(w?.message).toMatch(/0\.9/);
    expect(w?.message).toMatch(/common practice/);
    expect(r.drive).not.toBeNull();
  });
  it('a fully specified supply gets no such warning', () => {
    expect(solve(si(demo)).warnings.map((w) => w.code)).not.toContain('drive_defaults_assumed');
  });
});

describe('solve() wires the burst for a dual-resonant coil', () => {
  const d = si(demo);
  const r = solve(d);
  const dr = r.drive!;
  it('tunes primary + tank to tuningRatio × the target: drive.primaryFrequency within 0.1 %', () => {
    assertClose(dr.primaryFrequency, 0.9 * r.tuning!.targetFrequency, 1e-3, 'primary frequency');
    assertClose(r.tuning!.primaryTargetFrequency, 0.9 * r.tuning!.targetFrequency, 1e-12, 'tap target');
    assertClose(dr.frequencyRatio!, 0.9, 1e-3, 'ratio');
  });
  it('simulates the circuit at the tap: L1, M at the tap, the secondary pair with the streamer allowance, the tank', () => {
    expect(dr.circuit.L1).toBe(r.primary!.inductanceAtTap);
    expect(dr.circuit.M).toBe(r.coupling!.mutualInductanceAtTap);
    expect(dr.circuit.C1).toBe(r.tank!.capacitance);
    assertClose(dr.surgeImpedance!, Math.sqrt(dr.circuit.L1 / dr.circuit.C1!), 1e-9, 'surge impedance');
    // the streamer allowance (6 pF) sits on top of the secondary's own effective capacitance
    expect(dr.circuit.C2).toBeGreaterThan(r.system!.effectiveCapacitance);
    expect(dr.circuit.R1).toBeGreaterThan(0);
    expect(dr.circuit.R2).toBe(r.secondary!.acResistance);
  });
  it('checks each capacitor against its share of the peak voltage and the current of its string', () => {
    const b = dr.bank!;
    assertClose(b.unitPeakVoltage, dr.capacitorPeakVoltage! / 4, 1e-12, 'per capacitor');
    assertClose(b.stringRmsCurrent, dr.capacitorRmsCurrent! / 4, 1e-12, 'per string');
    assertClose(b.voltageMargin, 2000 / b.unitPeakVoltage, 1e-12, 'voltage margin');
    assertClose(b.currentMargin!, 10 / b.stringRmsCurrent, 1e-12, 'current margin');
    assertClose(dr.dutyCycle, 50e-6 * 150, 1e-9, 'duty');
    assertClose(dr.averagePower, dr.burstEnergy * 150, 1e-9, 'power');
  });
  it('gives no ½CV² of the bus: no energy per firing, no charged-bank bleeders, no rating over the bus', () => {
    expect(r.supply!.energyPerBang).toBeNull();
    expect(r.tank!.energyAtSupplyPeak).toBeNull();
    expect(r.tank!.bleeder).toBeNull();
    expect(r.tank!.ratingMargin).toBeNull();
    expect(r.tank!.perUnitVoltage).toBeNull();
  });
  it('warns when a capacitor’s voltage or current rating is exceeded, and is quiet within them', () => {
    const codes = (x: unknown) => solve(si(x)).warnings.map((w) => w.code);
    expect(codes(demo)).not.toContain('bank_unit_voltage_exceeded');
    expect(codes(demo)).not.toContain('bank_unit_current_exceeded');
    const tank = { ...demo.tank, unitVoltage: '1 kV', unitRmsCurrent: '3 A' };
    const c = codes({ ...demo, tank });
    expect(c).toContain('bank_unit_voltage_exceeded');
    expect(c).toContain('bank_unit_current_exceeded');
  });
  it('a transformer design has drive null; a single-resonant one needs no tank', () => {
    expect(solve(si(exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design)).drive).toBeNull();
    const single = solve(si({ ...demo, tank: null, supply: { ...demo.supply, topology: 'single-resonant' } }));
    expect(single.drive?.topology).toBe('single-resonant');
    expect(single.drive?.capacitorPeakVoltage).toBeNull();
    expect(single.drive?.surgeImpedance).toBeNull();
    expect(single.drive!.peakPrimaryCurrent).toBeGreaterThan(0);
  });
  it('refuses bad drive fields, naming the field', () => {
    const bad = (patch: Record<string, unknown>) => {
      const p = parseDesign({ ...demo, supply: { ...demo.supply, ...patch } });
      return p.ok ? [] : p.issues.map((i) => i.path);
    };
    expect(bad({ onTime: '3 kg' })).toContain('supply.onTime');
    expect(bad({ bridge: 'quarter' })).toContain('supply.bridge');
    expect(bad({ tuningRatio: 3 })).toContain('supply.tuningRatio');
  });
});

describe('goal-first for a bridge-driven coil', () => {
  const d = si(demo);
  const r = solve(d);
  it('the on-time for a target peak current gives that peak when put back into the design', () => {
    const a = onTimeForTargetPeak(d, 400);
    expect(a.ok).toBe(true);
    if (!a.ok) return;
    expect(a.value).toBeLessThan(50e-6);
    const back = solve(si({ ...demo, supply: { ...demo.supply, onTime: a.value, currentLimit: undefined } }));
    assertClose(back.drive!.peakPrimaryCurrent, 400, 5e-3, 'peak at the found on-time');
  });
  it('the tank capacitance for a target peak at the design’s on-time: more current needs more capacitance (lower surge impedance)', () => {
    const now = r.drive!.peakPrimaryCurrent;
    const up = tankForTargetPeak(d, 1.2 * now);
    const down = tankForTargetPeak(d, 0.8 * now);
    expect(up.ok && down.ok).toBe(true);
    if (!up.ok || !down.ok) return;
    expect(up.value.capacitance).toBeGreaterThan(r.tank!.capacitance);
    expect(down.value.capacitance).toBeLessThan(r.tank!.capacitance);
    expect(up.value.surgeImpedance).toBeLessThan(r.drive!.surgeImpedance!);
  });
  it('the tap for a tuning ratio is the tap the solver sets for that ratio', () => {
    const a = tapForTuningRatio(d, 0.85);
    expect(a.ok).toBe(true);
    if (!a.ok) return;
    const at = solve(si({ ...demo, supply: { ...demo.supply, tuningRatio: 0.85 } }));
    assertClose(a.value, at.tuning!.tapTurns!, 1e-6, 'tap');
    expect(a.value).toBeGreaterThan(r.tuning!.tapTurns!); // lower frequency: more turns
    expect(tapForTuningRatio(si(exampleDesigns[0].design), 0.9).ok).toBe(true);
    expect(onTimeForTargetPeak(si(exampleDesigns[0].design), 100).ok).toBe(false);
  });
});
