import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { C_0, EPSILON_0, MU_0 } from '../../src/solver/constants';
import { mutualInductanceLoops } from '../../src/solver/primary/inductance';
import {
  MEDHURST_ACCURACY,
  MEDHURST_TABLE,
  LONG_COIL_SLOPE,
  selfCapacitanceKnight,
  selfCapacitanceMedhurst,
} from '../../src/solver/secondary/capacitance';
import {
  inductanceSolenoidLorenz,
  inductanceSolenoidRoundWire,
  inductanceSolenoidWheeler1928,
  inductanceSolenoidWheeler1982,
  nagaokaCoefficient,
  rosaCorrection,
  rosaCorrectionA,
  rosaCorrectionB,
  inductanceSecondary,
  inductanceRingSum,
  ROSA_PITCH_LIMIT,
} from '../../src/solver/secondary/inductance';
import { qualityFactor, quarterWaveFrequency, resonantFrequencyLC } from '../../src/solver/secondary/resonance';
import { assertClose } from '../helpers/assertClose';
import pchipFixture from './fixtures/medhurst-pchip.json';
import nagaokaFixture from './fixtures/nagaoka.json';
import worked from '../../src/lib/validation/fixtures/worked-examples.json';

describe('nagaokaCoefficient', () => {
  // Rosa & Grover 1912 / Grover 1946 tables, 4 decimals (E. B. Rosa & F. W. Grover, Bull. Bur. Stand. 8(1), 1912; F. W. Grover, Inductance Calculations, 1946; from memory).
  const table: Array<[number, number]> = [
    [0.1, 0.9588], [0.2, 0.9201], [0.5, 0.8181], [1, 0.6884], [2, 0.5255], [4, 0.3654], [5, 0.3198], [10, 0.2033],
  ];
  it("nagaokaCoefficient(D/ℓ) matches Nagaoka's table to its 4th decimal", () => {
    for (const [x, k] of table) assertClose(nagaokaCoefficient(x), k, 0.5e-4 / k + 1e-9, `nagaokaCoefficient(${x}) vs table`);
  });

  it('nagaokaCoefficient(D/ℓ) matches the sheet integral of Maxwell filament mutuals (mpmath quad) to 1e-9', () => {
    for (const { diameterOverLength: x, K } of nagaokaFixture.values) {
      assertClose(nagaokaCoefficient(x), K, 1e-9, `nagaokaCoefficient(${x}) vs mpmath quadrature`);
    }
  });

  it('nagaokaCoefficient(D/ℓ) approaches 1 − 4D/(3πℓ) for very long coils', () => {
    const x = 1e-3;
    assertClose(nagaokaCoefficient(x), 1 - (4 * x) / (3 * Math.PI), 1e-6, 'nagaokaCoefficient(1e-3)');
  });
});

describe('inductanceSolenoidLorenz', () => {
  it('inductanceSolenoidLorenz(n, r, ℓ) tends to the thin-strip ring μ0N²r[ln(8r/ℓ) − ½] for very short coils', () => {
    const r = 0.1;
    const l = 1e-4;
    assertClose(inductanceSolenoidLorenz(10, r, l), MU_0 * 100 * r * (Math.log((8 * r) / l) - 0.5), 1e-5, 'ℓ/D = 5e-4');
  });

  it('inductanceSolenoidLorenz(n, r, ℓ) tends to μ0πr²N²/ℓ for very long coils', () => {
    assertClose(inductanceSolenoidLorenz(1e5, 0.01, 100), (MU_0 * Math.PI * 1e-4 * 1e10) / 100, 2e-4, 'ℓ/D = 5000');
  });

  it('inductanceSolenoidLorenz(n, r, ℓ) is positive and finite over wide ranges (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1e-3, max: 10, noNaN: true }),
        (n, r, l) => {
          const L = inductanceSolenoidLorenz(n, r, l);
          expect(Number.isFinite(L) && L > 0).toBe(true);
          // never more than the infinite-solenoid value
          expect(L).toBeLessThanOrEqual((MU_0 * Math.PI * r * r * n * n) / l * (1 + 1e-12));
        },
      ),
      { numRuns: 300 },
    );
  });

  it('inductanceSolenoidLorenz(n, r, ℓ) rejects zero or negative dimensions', () => {
    expect(() => inductanceSolenoidLorenz(0, 0.1, 0.1)).toThrow(/turns/);
    expect(() => inductanceSolenoidLorenz(10, -1, 0.1)).toThrow(/radius/);
    expect(() => inductanceSolenoidLorenz(10, 0.1, 0)).toThrow(/length/);
  });
});

describe('rosaCorrection', () => {
  it("rosaCorrectionB(N) matches Rosa's table B(2) = 0.1137, B(3) = 0.1663, B(5) = 0.2180, B(10) = 0.2664", () => {
    const rosa: Array<[number, number]> = [[2, 0.1137], [3, 0.1663], [5, 0.218], [10, 0.2664]];
    for (const [n, b] of rosa) assertClose(rosaCorrectionB(n), b, 0.5e-4 / b + 1e-9, `rosaCorrectionB(${n})`);
  });

  it('rosaCorrectionB(N) is 0 for one turn and tends to ln(2π) − 3/2 for many', () => {
    expect(rosaCorrectionB(1)).toBe(0);
    assertClose(rosaCorrectionB(1e7), Math.log(2 * Math.PI) - 1.5, 1e-5, 'rosaCorrectionB(1e7)');
    assertClose(rosaCorrectionB(1000), 0.3363949, 1e-6, 'rosaCorrectionB(1000) vs definition-based value');
  });

  it('rosaCorrectionA(p, d) is 0.5568528 + ln(d/p) at low frequency and 1/4 more at high frequency', () => {
    assertClose(rosaCorrectionA(2e-3, 1e-3, false), 1.25 - Math.log(4), 1e-15, 'LF A');
    assertClose(rosaCorrectionA(2e-3, 1e-3, true) - rosaCorrectionA(2e-3, 1e-3, false), 0.25, 1e-14, 'HF − LF');
  });

  it('rosaCorrection(N, r, p, d, LF) on the sheet matches the ring-filament sum of a 12-turn helix to 0.05 %', () => {
    // Ring model: Σ μ0 r[ln(8r/a) − 7/4] + Σ_{i≠j} M_Maxwell; 44.10336 µH by scipy 1.17.1 quadrature of Neumann's
    // integral (scripts/fixtures/worked_examples.py). Rosa's method: E. B. Rosa, Bull. Bur. Stand. 2(2), 1906 (from memory).
    const n = 12;
    const r = 0.15;
    const p = 0.0127;
    const a = 0.00635 / 2;
    let rings = 0;
    for (let i = 0; i < n; i++) {
      rings += MU_0 * r * (Math.log((8 * r) / a) - 1.75);
      for (let j = 0; j < n; j++) if (i !== j) rings += mutualInductanceLoops(r, r, Math.abs(i - j) * p);
    }
    const rosa = inductanceSolenoidLorenz(n, r, n * p) - rosaCorrection(n, r, p, 2 * a, false);
    assertClose(rosa, worked.rosaHelix.L, 1e-6, 'Rosa-corrected helix vs its independent computation (mpmath sheet, scipy GMD B)');
    assertClose(rosa, rings, 5e-4, 'Rosa-corrected helix vs ring sum');
    assertClose(rings, worked.ringPrimaries.find((q) => q.shape === 'helical')!.Llf, 1e-9, 'ring sum vs scipy quadrature');
  });
});

describe('inductanceSolenoidRoundWire', () => {
  it('inductanceSolenoidRoundWire(1 turn) equals the high-frequency loop inductance of a strip-corrected ring', () => {
    // One turn: B = 0, so L = Lorenz − μ0 r (3/2 − ln(2p/d)).
    const r = 0.1;
    const p = 0.002;
    const d = 0.001;
    const expected = inductanceSolenoidLorenz(1, r, p) - MU_0 * r * (1.5 - Math.log((2 * p) / d));
    assertClose(inductanceSolenoidRoundWire(1, r, p, d), expected, 1e-14, 'one turn');
    // and it is close to the HF loop formula μ0 r [ln(8r/a) − 2]
    assertClose(inductanceSolenoidRoundWire(1, r, p, d), MU_0 * r * (Math.log((8 * r) / (d / 2)) - 2), 2e-3, 'one turn vs loop');
  });

  it('inductanceSolenoidRoundWire(n, r, ℓ, d) lies below the sheet value for a close-wound 1000-turn secondary', () => {
    const sheet = inductanceSolenoidLorenz(1000, 0.05, 0.5);
    const wire = inductanceSolenoidRoundWire(1000, 0.05, 0.5, 0.45e-3);
    expect(wire).toBeLessThan(sheet);
    expect((sheet - wire) / sheet).toBeLessThan(0.01);
  });
});

describe('inductanceSolenoidWheeler1928', () => {
  it('inductanceSolenoidWheeler1928(12, 0.15, 0.1524) is the 44.38 µH worked example (the Wheeler inch formula evaluated in inches, scripts/fixtures/worked_examples.py)', () => {
    assertClose(inductanceSolenoidWheeler1928(12, 0.15, 0.1524), worked.wheelerSolenoid.L, 2e-4, 'helix Wheeler worked example');
  });

  it('inductanceSolenoidWheeler1928(n, r, ℓ) is 0.276 % below μ0πr²N²/(ℓ + 0.9r)', () => {
    const n = 500;
    const r = 0.05;
    const l = 0.4;
    const si = (MU_0 * Math.PI * r * r * n * n) / (l + 0.9 * r);
    assertClose(si / inductanceSolenoidWheeler1928(n, r, l), (10 * MU_0 * Math.PI * 0.0254) / 1e-6, 1e-12, 'ratio');
  });

  it('inductanceSolenoidWheeler1928(n, r, ℓ) is within 1 % of Lorenz for ℓ > 0.8r', () => {
    for (const l of [0.1, 0.3, 1, 3]) {
      assertClose(inductanceSolenoidWheeler1928(100, 0.1, l), inductanceSolenoidLorenz(100, 0.1, l), 0.01, `ℓ = ${l}`);
    }
  });
});

describe('inductanceSolenoidWheeler1982', () => {
  it('inductanceSolenoidWheeler1982(n, r, ℓ) is within 1e-4 of Lorenz for D/ℓ = 0.01…100', () => {
    for (const x of [0.01, 0.1, 0.5, 1, 2, 5, 10, 100]) {
      const r = 0.1;
      const l = (2 * r) / x;
      assertClose(inductanceSolenoidWheeler1982(50, r, l), inductanceSolenoidLorenz(50, r, l), 1e-4, `D/ℓ = ${x}`);
    }
  });
});

describe('selfCapacitanceMedhurst', () => {
  it("selfCapacitanceMedhurst(D, ℓ) reproduces Medhurst's H at the confirmed table rows ℓ/D = 1…5", () => {
    for (const row of MEDHURST_TABLE.filter((t) => t.lengthOverDiameter >= 1 && t.lengthOverDiameter <= 5)) {
      const D = 0.1;
      const { capacitance, inRange } = selfCapacitanceMedhurst(D, row.lengthOverDiameter * D);
      expect(inRange).toBe(true);
      assertClose(capacitance, row.H * 1e-12 * (D * 100), 1e-12, `ℓ/D = ${row.lengthOverDiameter}`);
    }
  });

  it('selfCapacitanceMedhurst(D, ℓ) interpolates like scipy PchipInterpolator in ln(ℓ/D)', () => {
    for (const { lengthOverDiameter: x, H } of pchipFixture.values) {
      assertClose(selfCapacitanceMedhurst(0.2, 0.2 * x).capacitance, H * 20e-12, 1e-12, `ℓ/D = ${x}`);
    }
  });

  it('selfCapacitanceMedhurst(D, ℓ) flags and extrapolates outside ℓ/D = 0.1…30', () => {
    const short = selfCapacitanceMedhurst(0.1, 0.005);
    expect(short.inRange).toBe(false);
    assertClose(short.capacitance, 0.96e-12 * 10, 1e-12, 'held at H(0.1)');
    const long = selfCapacitanceMedhurst(0.01, 0.6);
    expect(long.inRange).toBe(false);
    assertClose(long.capacitance, (3.4 + LONG_COIL_SLOPE * 30) * 1e-12, 1e-9, 'continued from H(30) at the long-coil slope 4ε0/π');
    expect(selfCapacitanceMedhurst(0.01, 0.3).inRange).toBe(true);
    expect(selfCapacitanceMedhurst(0.01, 0.31).inRange).toBe(false);
  });

  it('selfCapacitanceMedhurst(D, ℓ) never falls below the long-coil limit 4ε0ℓ/π for ℓ/D ≥ 10 (Knight 2013, §2 asymptote)', () => {
    for (const x of [10, 20, 30, 40, 50, 100, 400]) {
      const D = 0.05;
      const { capacitance } = selfCapacitanceMedhurst(D, x * D);
      expect(capacitance, `ℓ/D = ${x}`).toBeGreaterThan(((4 * EPSILON_0) / Math.PI) * x * D);
    }
    assertClose(LONG_COIL_SLOPE, 0.112734, 1e-5, '4ε0/π in pF/cm');
    expect(MEDHURST_ACCURACY).toBe(0.05);
  });

  it('selfCapacitanceMedhurst(D, ℓ) is positive, finite and grows with size (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 2, noNaN: true }), fc.double({ min: 1e-3, max: 20, noNaN: true }), (D, l) => {
        const a = selfCapacitanceMedhurst(D, l).capacitance;
        const b = selfCapacitanceMedhurst(2 * D, 2 * l).capacitance;
        expect(Number.isFinite(a) && a > 0).toBe(true);
        assertClose(b, 2 * a, 1e-12, 'C scales with size');
      }),
      { numRuns: 200 },
    );
  });

  it('selfCapacitanceKnight(D, ℓ, εi = 2.5) agrees with the Medhurst table within its 5 % for ℓ/D = 0.1…10', () => {
    for (const row of MEDHURST_TABLE.filter((t) => t.lengthOverDiameter <= 10)) {
      const D = 0.1;
      const knight = selfCapacitanceKnight(D, row.lengthOverDiameter * D, { innerPermittivity: 2.5 });
      assertClose(knight, row.H * 1e-11, MEDHURST_ACCURACY, `Knight vs Medhurst at ℓ/D = ${row.lengthOverDiameter}`);
    }
  });
});

describe('resonantFrequencyLC', () => {
  it('resonantFrequencyLC(L, C) is 1/(2π√(LC)) (Thomson) and quarterWaveFrequency(ℓ) is c/4ℓ', () => {
    assertClose(resonantFrequencyLC(1e-3, 1e-9), 1 / (2 * Math.PI * 1e-6), 1e-15, 'f(1 mH, 1 nF)');
    assertClose(quarterWaveFrequency(299.792458), C_0 / (4 * 299.792458), 1e-15, 'quarter wave');
    assertClose(qualityFactor(1e-3, 10, 1e5), (2 * Math.PI * 1e5 * 1e-3) / 10, 1e-15, 'Q');
    expect(() => resonantFrequencyLC(0, 1)).toThrow(RangeError);
  });
});

describe('inductanceSecondary: Rosa only where the pitch is small against the radius', () => {
  it('one turn on a 10 m winding length is one loop, μ0r[ln(8r/a) − 2] (Kirchhoff HF loop; REFERENCES c2)', () => {
    const r = 0.05;
    const d = 0.001;
    const got = inductanceSecondary(1, r, 10, d);
    expect(got.method).toBe('ringSum');
    assertClose(got.inductance, MU_0 * r * (Math.log((8 * r) / (d / 2)) - 2), 1e-12, 'single loop');
  });
  it('5 turns of 12 mm wire at 0.4 m pitch: the ring sum of Maxwell mutuals (Maxwell 1873, art. 701)', () => {
    const r = 0.3;
    const got = inductanceSecondary(5, r, 2, 0.012);
    expect(got.method).toBe('ringSum');
    let sum = 5 * MU_0 * r * (Math.log((8 * r) / 0.006) - 2);
    for (let i = 0; i < 5; i++) for (let j = 0; j < 5; j++) if (i !== j) sum += mutualInductanceLoops(r, r, Math.abs(i - j) * 0.4);
    assertClose(got.inductance, sum, 1e-12, 'ring sum');
  });
  it('close-wound keeps Rosa, and at the limit both methods agree within 0.1 % (REFERENCES a3: 0.02 % at p = 0.085 r)', () => {
    expect(inductanceSecondary(1000, 0.057, 0.564, 0.0005).method).toBe('rosa');
    const r = 0.15;
    const p = ROSA_PITCH_LIMIT * r;
    const rosa = inductanceSolenoidRoundWire(12, r, 12 * p, 0.00635);
    const rings = inductanceRingSum(12, r, p, 0.00635);
    assertClose(rosa, rings, 1e-3, 'Rosa vs ring sum at the switch-over');
  });
});
