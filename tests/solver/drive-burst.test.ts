import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  onTimeForPeakCurrent,
  simulateBurst,
  tankCapacitanceForPeakCurrent,
  type BurstCircuitSI,
  type DriveSettingsSI,
} from '../../src/solver';
import { assertClose } from '../helpers/assertClose';

interface ReferenceCase {
  name: string;
  settings: DriveSettingsSI;
  circuit: BurstCircuitSI;
  expected: {
    peakPrimaryCurrent: number;
    capacitorPeakVoltage: number | null;
    secondaryPeakVoltage: number;
    baseCurrentPeak: number;
    timeToCurrentLimit: number | null;
    burstEnergy: number;
    dissipated: number;
    stored: number;
    integralI1Squared: number;
    switchingInstants: number[];
  };
}
const reference = JSON.parse(readFileSync(resolve(import.meta.dirname, 'fixtures/burst-reference.json'), 'utf8')) as {
  libraries: Record<string, string>;
  cases: ReferenceCase[];
};

const settings = (patch: Partial<DriveSettingsSI> = {}): DriveSettingsSI => ({
  topology: 'dual-resonant',
  bridge: 'full',
  busVoltage: 100,
  onTime: 200e-6,
  repetitionRate: 200,
  switchPeakCurrent: null,
  currentLimit: null,
  busCapacitance: null,
  tuningRatio: 0.9,
  ...patch,
});
const capacitanceFor = (L: number, f: number) => 1 / ((2 * Math.PI * f) ** 2 * L);

// A lossless series LC (10 µH, 100 kHz) with the secondary present but uncoupled (M = 0).
const L = 10e-6;
const f0 = 100e3;
const T = 1 / f0;
const lossless: BurstCircuitSI = { L1: L, C1: capacitanceFor(L, f0), R1: 0, L2: 50e-3, C2: capacitanceFor(50e-3, 110e3), R2: 0, M: 0 };

describe('simulateBurst: square-wave drive of an undamped series RLC at resonance (Nilsson & Riedel, Electric Circuits, Fourier series of a square wave; series resonance)', () => {
  // The fundamental of a ±V square wave has amplitude 4V/π; at resonance an undamped series LC driven by
  // it grows its current envelope as (4V/π)/(2L)·t = 2Vt/(πL). The envelope's crests fall at (n − ½)·T/2.
  for (const bridge of ['full', 'half'] as const) {
    it(`simulateBurst(${bridge} bridge, M = 0) grows the primary current envelope as 2Vt/(πL) within 0.5 %`, () => {
      const V = bridge === 'full' ? 100 : 50;
      for (const crests of [4, 17, 40, 81]) {
        const crest = (crests - 0.5) * (T / 2);
        const r = simulateBurst(settings({ bridge, onTime: crest + T / 8 }), lossless);
        assertClose(r.peakPrimaryCurrent, (2 * V * crest) / (Math.PI * L), 0.005, `peak |i1| at the crest t = ${crest} s, ${bridge} bridge`);
        expect(r.secondaryPeakVoltage).toBe(0);
      }
      // growth rate between two on-times
      const a = simulateBurst(settings({ bridge, onTime: 9.5 * (T / 2) + T / 8 }), lossless).peakPrimaryCurrent;
      const b = simulateBurst(settings({ bridge, onTime: 59.5 * (T / 2) + T / 8 }), lossless).peakPrimaryCurrent;
      assertClose((b - a) / (50 * (T / 2)), (2 * V) / (Math.PI * L), 0.005, `envelope slope, ${bridge} bridge`);
    });
  }

  it('simulateBurst switches at the current zeros of the lossless tank: every half period T/2 (within 1 % of a period)', () => {
    const r = simulateBurst(settings({ onTime: 98e-6 }), lossless);
    expect(r.switchingInstants.length).toBe(19);
    r.switchingInstants.forEach((t, n) => assertClose(t / T, (n + 1) / 2, 0.01 / ((n + 1) / 2), `switching instant ${n + 1}`));
    assertClose(r.surgeImpedance ?? NaN, Math.sqrt(L / capacitanceFor(L, f0)), 1e-12, 'surge impedance √(L/C)');
    assertClose(r.primaryFrequency, f0, 1e-12, 'primary frequency 1/(2π√(LC))');
  });
});

describe(`simulateBurst against scipy solve_ivp with event-located zero crossings (scripts/fixtures/burst_reference.py; scipy ${reference.libraries.scipy})`, () => {
  for (const c of reference.cases) {
    it(`simulateBurst(${c.name}) matches the peaks within 0.5 % and the switching instants within 1 % of a period`, () => {
      const r = simulateBurst(c.settings, c.circuit);
      const e = c.expected;
      assertClose(r.peakPrimaryCurrent, e.peakPrimaryCurrent, 0.005, `${c.name}: peak primary current`);
      assertClose(r.secondaryPeakVoltage, e.secondaryPeakVoltage, 0.005, `${c.name}: secondary peak voltage`);
      assertClose(r.baseCurrentPeak, e.baseCurrentPeak, 0.005, `${c.name}: base current peak`);
      if (e.capacitorPeakVoltage === null) expect(r.capacitorPeakVoltage).toBeNull();
      else assertClose(r.capacitorPeakVoltage ?? NaN, e.capacitorPeakVoltage, 0.005, `${c.name}: capacitor peak voltage`);
      assertClose(r.burstEnergy, e.burstEnergy, 0.005, `${c.name}: energy drawn from the bus`);
      const period = 1 / r.primaryFrequency;
      expect(r.switchingInstants.length, `${c.name}: number of switchings`).toBe(e.switchingInstants.length);
      r.switchingInstants.forEach((t, i) => {
        const err = Math.abs(t - e.switchingInstants[i]) / period;
        if (!(err <= 0.01)) throw new Error(`${c.name}: switching ${i} at ${t} s, expected ${e.switchingInstants[i]} s, ${err} of a period > 0.01`);
      });
      if (e.timeToCurrentLimit === null) expect(r.timeToCurrentLimit).toBeNull();
      else expect(Math.abs((r.timeToCurrentLimit ?? NaN) - e.timeToCurrentLimit) / period, `${c.name}: time to the current limit`).toBeLessThan(0.01);
      if (r.capacitorRmsCurrent !== null) {
        assertClose(r.capacitorRmsCurrent, Math.sqrt(e.integralI1Squared * c.settings.repetitionRate), 0.005, `${c.name}: bank RMS current`);
      }
    });
  }

  it('the reference cases trip the current limit before the end of the on-time in two designs and not in the third', () => {
    expect(reference.cases.map((c) => c.expected.timeToCurrentLimit !== null)).toEqual([true, true, false]);
  });
});

describe('simulateBurst energy balance: drawn from the bus = stored + dissipated (conservation of energy)', () => {
  for (const c of reference.cases) {
    it(`simulateBurst(${c.name}) balances within 1e-3`, () => {
      const { drawn, stored, dissipated, relativeError } = simulateBurst(c.settings, c.circuit).energyBalance;
      expect(drawn).toBeGreaterThan(0);
      expect(dissipated).toBeGreaterThan(0);
      assertClose(stored + dissipated, drawn, 1e-3, `${c.name}: stored + dissipated`);
      // the method holds it near 1e-10; 1e-6 still catches a 0.1 % error in either resistance's share
      assertClose(stored + dissipated, drawn, 1e-6, `${c.name}: stored + dissipated (method's own accuracy)`);
      expect(relativeError).toBeLessThan(1e-6);
      assertClose(dissipated, c.expected.dissipated, 1e-4, `${c.name}: energy dissipated, against scipy`);
      assertClose(stored, c.expected.stored, 1e-4, `${c.name}: energy stored at the end, against scipy`);
    });
  }
});

describe('simulateBurst bank RMS current against a linear-ramp envelope (RMS of a sinusoid ramped from 0 to P is P/√6)', () => {
  // ∫₀ᵀ (P t/T)² sin²(ωt) dt / T = P²/6 over the burst, and the bank carries it for onTime × rate of the time.
  it('simulateBurst(lossless, uncoupled) gives capacitorRmsCurrent = P/√6 · √(onTime·rate) within 2 %', () => {
    for (const [onTime, rate] of [
      [100e-6, 200],
      [250e-6, 120],
    ] as const) {
      const r = simulateBurst(settings({ onTime, repetitionRate: rate }), lossless);
      const envelope = (2 * 100 * onTime) / (Math.PI * L);
      assertClose(r.capacitorRmsCurrent ?? NaN, (envelope / Math.sqrt(6)) * Math.sqrt(onTime * rate), 0.02, `bank RMS, onTime ${onTime} s, ${rate} Hz`);
      assertClose(r.dutyCycle, onTime * rate, 1e-12, 'duty cycle');
      assertClose(r.averagePower, r.burstEnergy * rate, 1e-12, 'average power');
    }
  });
});

describe('simulateBurst reports the trip and the bus droop', () => {
  it('simulateBurst(currentLimit) gives the first time |i1| reaches the limit and carries the burst on to the on-time', () => {
    // Lossless tank: half-cycle n is a half sine of amplitude (2n − 1)V/Z, so 300 A is first reached in
    // the half-cycle whose amplitude exceeds it (the textbook step-by-step solution of the switched LC).
    const Z = Math.sqrt(L / capacitanceFor(L, f0));
    const n = Math.ceil((300 * Z) / 100 / 2 + 0.5);
    const expected = (n - 1) * (T / 2) + Math.asin((300 * Z) / ((2 * n - 1) * 100)) / (2 * Math.PI * f0);
    const r = simulateBurst(settings({ currentLimit: 300, switchPeakCurrent: 1000 }), lossless);
    expect(Math.abs((r.timeToCurrentLimit ?? NaN) - expected) / T).toBeLessThan(1e-6);
    expect(r.peakPrimaryCurrent).toBeGreaterThan(1000);
    // without a trip setting, the switches' rating is the limit
    const s = simulateBurst(settings({ switchPeakCurrent: 1000 }), lossless);
    expect(s.timeToCurrentLimit).toBeGreaterThan(r.timeToCurrentLimit ?? Infinity);
    expect(simulateBurst(settings({ switchPeakCurrent: 1e5 }), lossless).timeToCurrentLimit).toBeNull();
  });

  it('simulateBurst(busCapacitance) gives the first-order droop E/(C V) and null without a bus capacitance', () => {
    const r = simulateBurst(settings({ busCapacitance: 2e-3 }), lossless);
    assertClose(r.busDroop ?? NaN, r.burstEnergy / (2e-3 * 100), 1e-12, 'bus droop');
    expect(simulateBurst(settings(), lossless).busDroop).toBeNull();
  });

  it('simulateBurst keeps the waveform to at most 2000 points in time order, ending at the on-time', () => {
    const r = simulateBurst(settings({ onTime: 1e-3 }), lossless);
    expect(r.waveform.time.length).toBeLessThanOrEqual(2000);
    expect(r.waveform.time.length).toBeGreaterThan(1000);
    expect(r.waveform.primaryCurrent.length).toBe(r.waveform.time.length);
    expect(r.waveform.secondaryVoltage.length).toBe(r.waveform.time.length);
    for (let i = 1; i < r.waveform.time.length; i++) expect(r.waveform.time[i]).toBeGreaterThan(r.waveform.time[i - 1]);
    assertClose(r.waveform.time.at(-1) ?? NaN, 1e-3, 1e-9, 'last sample time');
    // the envelope is kept: the largest sample is the peak to within the step's sampling
    assertClose(Math.max(...r.waveform.primaryCurrent.map(Math.abs)), r.peakPrimaryCurrent, 1e-3, 'waveform peak');
  });

  it('simulateBurst refuses a circuit it cannot simulate with a message naming the quantity', () => {
    expect(() => simulateBurst(settings(), { ...lossless, C1: null })).toThrow(/C1/);
    expect(() => simulateBurst(settings(), { ...lossless, M: Math.sqrt(lossless.L1 * lossless.L2) })).toThrow(/M/);
    expect(() => simulateBurst(settings({ onTime: 0 }), lossless)).toThrow(/onTime/);
    expect(() => simulateBurst(settings({ onTime: 1 }), lossless)).toThrow(/periods/);
  });
});

describe('onTimeForPeakCurrent and tankCapacitanceForPeakCurrent (goal-first), against the switched LC solution', () => {
  it('onTimeForPeakCurrent(lossless, 500 A) is the time the half-sine of amplitude (2n − 1)V/Z first reaches 500 A', () => {
    const Z = Math.sqrt(L / capacitanceFor(L, f0));
    const n = Math.ceil((500 * Z) / 100 / 2 + 0.5);
    const expected = (n - 1) * (T / 2) + Math.asin((500 * Z) / ((2 * n - 1) * 100)) / (2 * Math.PI * f0);
    const g = onTimeForPeakCurrent(settings(), lossless, 500);
    expect(g.reason).toBeNull();
    expect(Math.abs((g.onTime ?? NaN) - expected) / T).toBeLessThan(1e-6);
    assertClose(simulateBurst(settings({ onTime: g.onTime ?? NaN }), lossless).peakPrimaryCurrent, 500, 1e-6, 'peak at the found on-time');
  });

  it('onTimeForPeakCurrent gives null with a reason when the resistance caps the current below the target', () => {
    // steady state of the fundamental: 4V/(π R1) = 127.3 A for R1 = 1 Ω (the harmonics add under 0.1 % at Q = 6.3)
    const g = onTimeForPeakCurrent(settings(), { ...lossless, R1: 1 }, 500);
    expect(g.onTime).toBeNull();
    expect(g.reason).toMatch(/reaches only/);
    assertClose(g.largestPeak, (4 * 100) / Math.PI, 0.002, 'steady-state peak 4V/(πR1)');
  });

  it('tankCapacitanceForPeakCurrent(lossless) gives the C whose last crest (2N − 1)V/Z meets the target', () => {
    const N = 30;
    const onTime = (N - 0.5) * (T / 2) + T / 8;
    const target = 800;
    const g = tankCapacitanceForPeakCurrent(settings({ onTime }), { L1: L, R1: 0, L2: 50e-3, C2: lossless.C2, R2: 0, M: 0 }, target, f0);
    expect(g.reason).toBeNull();
    const Z = ((2 * N - 1) * 100) / target;
    assertClose(g.surgeImpedance ?? NaN, Z, 1e-5, 'surge impedance');
    assertClose(g.capacitance ?? NaN, 1 / (2 * Math.PI * f0 * Z), 1e-5, 'tank capacitance 1/(ωZ)');
    assertClose(g.inductance ?? NaN, Z / (2 * Math.PI * f0), 1e-5, 'primary inductance Z/ω');
  });

  it('tankCapacitanceForPeakCurrent(coupled reference design) gives a tank that reproduces the target on re-simulation', () => {
    const c = reference.cases[1];
    const k = c.circuit.M / Math.sqrt(c.circuit.L1 * c.circuit.L2);
    const g = tankCapacitanceForPeakCurrent(c.settings, c.circuit, 900, 85e3);
    expect(g.reason).toBeNull();
    const L1 = g.inductance ?? NaN;
    const r = simulateBurst(c.settings, { ...c.circuit, L1, C1: g.capacitance, M: k * Math.sqrt(L1 * c.circuit.L2) });
    assertClose(r.peakPrimaryCurrent, 900, 1e-5, 'peak with the found tank');
    assertClose(r.primaryFrequency, 85e3, 1e-9, 'tuned frequency');
  });

  it('tankCapacitanceForPeakCurrent gives null with a reason for a single-resonant coil and an unreachable target', () => {
    const single = reference.cases[2];
    expect(tankCapacitanceForPeakCurrent(single.settings, single.circuit, 100, 300e3).reason).toMatch(/no tank/);
    const capped = tankCapacitanceForPeakCurrent(settings(), { ...lossless, R1: 2 }, 5000, f0);
    expect(capped.capacitance).toBeNull();
    expect(capped.reason).toMatch(/no tank reaches .* 4V\/\(πR1\)/);
  });
});

describe('simulateBurst over random sane circuits (fast-check property)', () => {
  const arb = fc.record({
    dual: fc.boolean(),
    full: fc.boolean(),
    bus: fc.double({ min: 20, max: 700, noNaN: true }),
    onTime: fc.double({ min: 5e-6, max: 300e-6, noNaN: true }),
    rate: fc.double({ min: 10, max: 1000, noNaN: true }),
    L1: fc.double({ min: 0.5e-6, max: 60e-6, noNaN: true }),
    ratio: fc.double({ min: 0.7, max: 1.3, noNaN: true }),
    f2: fc.double({ min: 40e3, max: 500e3, noNaN: true }),
    L2: fc.double({ min: 2e-3, max: 150e-3, noNaN: true }),
    k: fc.double({ min: 0, max: 0.5, noNaN: true }),
    R1: fc.double({ min: 0, max: 2, noNaN: true }),
    R2: fc.double({ min: 0, max: 2000, noNaN: true }),
    limit: fc.option(fc.double({ min: 10, max: 2000, noNaN: true }), { nil: null }),
  });
  it('simulateBurst gives finite, non-negative peaks and balances energy within 1e-3', () => {
    fc.assert(
      fc.property(arb, (p) => {
        const circuit: BurstCircuitSI = {
          L1: p.L1,
          C1: p.dual ? capacitanceFor(p.L1, p.f2 * p.ratio) : null,
          R1: p.R1,
          L2: p.L2,
          C2: capacitanceFor(p.L2, p.f2),
          R2: p.R2,
          M: p.k * Math.sqrt(p.L1 * p.L2),
        };
        const s = settings({
          topology: p.dual ? 'dual-resonant' : 'single-resonant',
          bridge: p.full ? 'full' : 'half',
          busVoltage: p.bus,
          onTime: p.onTime,
          repetitionRate: p.rate,
          currentLimit: p.limit,
          busCapacitance: 1e-3,
        });
        const r = simulateBurst(s, circuit);
        const numbers = [
          r.peakPrimaryCurrent,
          r.secondaryPeakVoltage,
          r.baseCurrentPeak,
          r.burstEnergy,
          r.averagePower,
          r.busDroop ?? 0,
          r.capacitorPeakVoltage ?? 0,
          r.capacitorRmsCurrent ?? 0,
          ...r.waveform.primaryCurrent,
          ...r.waveform.secondaryVoltage,
        ];
        expect(numbers.every(Number.isFinite)).toBe(true);
        for (const x of [r.peakPrimaryCurrent, r.secondaryPeakVoltage, r.baseCurrentPeak, r.capacitorPeakVoltage ?? 0, r.capacitorRmsCurrent ?? 0]) {
          expect(x).toBeGreaterThanOrEqual(0);
        }
        expect(r.peakPrimaryCurrent).toBeGreaterThan(0);
        expect(r.burstEnergy).toBeGreaterThanOrEqual(0);
        expect(r.energyBalance.relativeError).toBeLessThan(1e-3);
        expect(r.waveform.time.length).toBeLessThanOrEqual(2000);
        for (let i = 1; i < r.switchingInstants.length; i++) expect(r.switchingInstants[i]).toBeGreaterThan(r.switchingInstants[i - 1]);
        if (r.timeToCurrentLimit !== null) expect(r.timeToCurrentLimit).toBeLessThanOrEqual(p.onTime);
      }),
      { numRuns: 60, seed: 20240612 },
    );
  });
});
