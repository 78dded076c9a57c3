import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MU_0 } from '../../src/solver/constants';
import {
  type PrimaryGeometry,
  primaryConductorLength,
  primaryOuterDiameter,
  primaryRings,
  primaryRingsAtTap,
} from '../../src/solver/primary/geometry';
import {
  inductanceFlatSpiralWheeler,
  inductanceLoopRoundWire,
  inductancePrimary,
  inductancePrimaryWheeler,
  mutualInductanceLoops,
} from '../../src/solver/primary/inductance';
import { integrateGauss } from '../../src/solver/math/gauss';
import { assertClose } from '../helpers/assertClose';
import library from '../../src/lib/validation/fixtures/physics-library.json';
import worked from '../../src/lib/validation/fixtures/worked-examples.json';

// Worked examples: 12 turns, 6.35 mm conductor, 6.35 mm gap, first turn at r = 0.10 m. Their reference values
// are the ring model computed independently with scipy 1.17.1 quadrature of Neumann's integral and Wheeler's
// inch formulas evaluated in inches (scripts/fixtures/worked_examples.py → worked-examples.json).
const flat: PrimaryGeometry = { shape: 'flat', innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 };
const cone: PrimaryGeometry = { ...flat, shape: 'conical', angle: Math.PI / 6 };
const helix: PrimaryGeometry = { ...flat, shape: 'helical', innerDiameter: 0.3 };
const ring = (shape: string) => worked.ringPrimaries.find((p) => p.shape === shape)!;

describe('mutualInductanceLoops', () => {
  it("mutualInductanceLoops(a, b, d) matches Neumann's integral by scipy quad to 1e-11", () => {
    for (const { a, b, d, M } of library.maxwellMutual) {
      assertClose(mutualInductanceLoops(a, b, d), M, 1e-11, `mutualInductanceLoops(${a}, ${b}, ${d})`);
    }
  });

  it('mutualInductanceLoops(a, b, d) tends to the dipole limit μ0πa²b²/(2d³) far apart', () => {
    assertClose(mutualInductanceLoops(0.01, 0.02, 100), (MU_0 * Math.PI * 1e-4 * 4e-4) / (2 * 1e6), 1e-7, 'd = 100 m');
  });

  it('mutualInductanceLoops(a, b, d) is symmetric, even in d, positive and finite (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        (a, b, d) => {
          const m = mutualInductanceLoops(a, b, d);
          expect(Number.isFinite(m) && m > 0).toBe(true);
          assertClose(mutualInductanceLoops(b, a, -d), m, 1e-13, `symmetry a=${a} b=${b} d=${d}`);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('inductanceLoopRoundWire', () => {
  it('inductanceLoopRoundWire(R, a) matches Neumann M at the GMD (scipy quad): HF at a, LF at a·e^(−1/4)', () => {
    for (const { R, wireRadius, MhfAtA, MlfAtGmd } of library.loopAtGmd) {
      assertClose(inductanceLoopRoundWire(R, wireRadius, true), MhfAtA, 3e-4, `HF loop R=${R} a=${wireRadius}`);
      assertClose(inductanceLoopRoundWire(R, wireRadius, false), MlfAtGmd, 3e-4, `LF loop R=${R} a=${wireRadius}`);
    }
  });

  it('inductanceLoopRoundWire(R, a) rejects a wire thicker than the loop', () => {
    expect(() => inductanceLoopRoundWire(0.01, 0.02)).toThrow(RangeError);
  });
});

describe('primaryRings', () => {
  it('primaryRings(p) steps r by the pitch (flat), z by the pitch (helix) and along the slant (cone)', () => {
    const pitch = 0.0127;
    const f = primaryRings(flat);
    expect(f).toHaveLength(12);
    assertClose(f[11].r, 0.1 + 11 * pitch, 1e-14, 'flat outer ring radius');
    expect(f[11].z).toBe(0);
    const h = primaryRings({ ...helix, elevation: 0.02 });
    assertClose(h[11].z, 0.02 + 11 * pitch, 1e-14, 'helix top ring height');
    expect(h[11].r).toBe(0.15);
    const c = primaryRings(cone);
    assertClose(c[1].r - c[0].r, pitch * Math.cos(Math.PI / 6), 1e-12, 'cone radial step');
    assertClose(c[1].z - c[0].z, pitch * 0.5, 1e-12, 'cone vertical step');
  });

  it('primaryRingsAtTap(p, tap) keeps whole turns and weights the last partial one', () => {
    const rings = primaryRingsAtTap(flat, 3.25);
    expect(rings.map((r) => r.weight)).toEqual([1, 1, 1, 0.25]);
    expect(primaryRingsAtTap(flat, 0)).toEqual([]);
    expect(() => primaryRingsAtTap(flat, 12.5)).toThrow(/tap/);
  });

  it('primaryRings(p) names the field for an impossible primary', () => {
    expect(() => primaryRings({ ...flat, innerDiameter: 0.001 })).toThrow(/innerDiameter/);
    expect(() => primaryRings({ ...cone, angle: undefined })).toThrow(/angle/);
    expect(() => primaryRings({ ...flat, spacing: -1 })).toThrow(/spacing/);
  });
});

describe('primaryConductorLength', () => {
  it('primaryConductorLength(helix) is N√((2πr)² + p²) (closed form)', () => {
    assertClose(primaryConductorLength(helix), 12 * Math.hypot(2 * Math.PI * 0.15, 0.0127), 1e-14, 'helix length');
  });

  it('primaryConductorLength(flat / cone) equals the numerically integrated spiral arc length', () => {
    for (const p of [flat, cone]) {
      const pitch = p.conductorDiameter + p.spacing;
      const cos = Math.cos(p.shape === 'flat' ? 0 : (p.angle as number));
      const ds = (s: number) => Math.sqrt(1 + Math.pow((2 * Math.PI * (0.1 + s * cos)) / pitch, 2));
      let numeric = 0;
      for (let k = 0; k < 12; k++) numeric += integrateGauss(ds, (k - 0.5) * pitch, (k + 0.5) * pitch, 16);
      assertClose(primaryConductorLength(p), numeric, 1e-12, `${p.shape} spiral length`);
      // and it is close to the ring model's Σ 2πr
      const rings = primaryRings(p).reduce((s, r) => s + 2 * Math.PI * r.r, 0);
      assertClose(primaryConductorLength(p), rings, 1e-3, `${p.shape} vs Σ2πr`);
    }
  });

  it('primaryOuterDiameter(p) is the outermost centre-line diameter plus one conductor', () => {
    assertClose(primaryOuterDiameter(flat), 0.2 + 2 * 11 * 0.0127 + 0.00635, 1e-14, 'flat');
    assertClose(primaryOuterDiameter(helix), 0.3 + 0.00635, 1e-14, 'helix');
  });
});

describe('inductancePrimary', () => {
  it('worked-examples.json rounds to the figures quoted below (52.38, 53.02, 48.08, 43.54, 44.10, 53.89, 44.38 µH)', () => {
    const q = [ring('flat').Lhf, ring('flat').Llf, ring('conical30').Lhf, ring('helical').Lhf, ring('helical').Llf, worked.wheelerSpiral.L, worked.wheelerSolenoid.L];
    expect(q.map((x) => (x * 1e6).toFixed(2))).toEqual(['52.38', '53.02', '48.08', '43.54', '44.10', '53.89', '44.38']);
  });

  it('inductancePrimary(flat) is the 52.38 µH HF / 53.02 µH LF ring-model worked example', () => {
    assertClose(inductancePrimary(flat), ring('flat').Lhf, 1e-4, 'flat HF');
    assertClose(inductancePrimary(flat, 12, false), ring('flat').Llf, 1e-4, 'flat LF');
  });

  it('inductancePrimary(30° cone) is the 48.08 µH worked example', () => {
    assertClose(inductancePrimary(cone), ring('conical30').Lhf, 1e-4, 'cone HF');
  });

  it('inductancePrimary(helix) is the 43.54 µH HF / 44.10 µH LF worked example', () => {
    assertClose(inductancePrimary(helix), ring('helical').Lhf, 1e-4, 'helix HF');
    assertClose(inductancePrimary(helix, 12, false), ring('helical').Llf, 1e-4, 'helix LF');
  });

  it('inductancePrimary(p, 1) is the single-loop inductance', () => {
    assertClose(inductancePrimary(flat, 1), inductanceLoopRoundWire(0.1, 0.003175), 1e-15, 'one turn');
  });

  it('inductancePrimary(p, tap) is continuous and increasing in the tap (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 11.9, noNaN: true }), (tap) => {
        const a = inductancePrimary(flat, tap);
        const b = inductancePrimary(flat, tap + 0.05);
        expect(b).toBeGreaterThan(a);
        // continuity across a whole-turn boundary
        const whole = Math.ceil(tap);
        if (whole <= 12) assertClose(inductancePrimary(flat, whole - 1e-9), inductancePrimary(flat, whole), 1e-6, `continuity at ${whole}`);
      }),
      { numRuns: 100 },
    );
  });
});

describe('inductanceFlatSpiralWheeler', () => {
  it('inductanceFlatSpiralWheeler(a, N, c) gives the 53.89 µH worked example (a = mean ring radius, c = N·pitch)', () => {
    assertClose(inductanceFlatSpiralWheeler((0.1 + 0.1 + 11 * 0.0127) / 2, 12, 12 * 0.0127), worked.wheelerSpiral.L, 2e-4, 'Wheeler spiral');
    assertClose(inductancePrimaryWheeler(flat) ?? 0, worked.wheelerSpiral.L, 2e-4, 'inductancePrimaryWheeler(flat)');
  });

  it('inductancePrimaryWheeler(p) is within 5 % of the ring model for flat and helical primaries, null for a cone', () => {
    assertClose(inductancePrimaryWheeler(flat) ?? 0, inductancePrimary(flat, 12, false), 0.05, 'flat');
    assertClose(inductancePrimaryWheeler(helix) ?? 0, worked.wheelerSolenoid.L, 2e-4, 'helix worked example');
    expect(inductancePrimaryWheeler(cone)).toBeNull();
  });
});
