import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EPSILON_0 } from '../../src/solver/constants';
import { capacitanceAxisymmetricBEM, DEFAULT_PANELS, toploadCapacitance } from '../../src/solver/topload/bem';
import { capacitanceSphere, capacitanceSphereOverPlane } from '../../src/solver/topload/sphere';
import {
  capacitanceToroidEmpirical,
  capacitanceTorusIsolated,
  legendrePHalf,
  legendreQHalf,
} from '../../src/solver/topload/torus';
import { assertClose } from '../helpers/assertClose';
import library from '../../src/lib/validation/fixtures/physics-library.json';
import worked from '../../src/lib/validation/fixtures/worked-examples.json';
import legendre from './fixtures/toroidal-legendre.json';

describe('capacitanceSphere', () => {
  it('capacitanceSphere(a) is 4πε0a (closed form)', () => {
    assertClose(capacitanceSphere(0.15), 4 * Math.PI * EPSILON_0 * 0.15, 1e-15, 'capacitanceSphere(0.15)');
  });
});

describe('capacitanceSphereOverPlane', () => {
  it("capacitanceSphereOverPlane(a, h) matches Kelvin's image charges built step by step (mpmath)", () => {
    for (const { a, h, C } of library.sphereOverPlane) {
      assertClose(capacitanceSphereOverPlane(a, h), C, 1e-12, `capacitanceSphereOverPlane(${a}, ${h})`);
    }
  });

  it('capacitanceSphereOverPlane(a, h) tends to the isolated sphere far from the plane', () => {
    assertClose(capacitanceSphereOverPlane(0.1, 1000), capacitanceSphere(0.1) * (1 + 0.1 / 2000), 1e-7, 'h/a = 1e4');
  });

  it('capacitanceSphereOverPlane(a, h) rejects a sphere touching the ground', () => {
    expect(() => capacitanceSphereOverPlane(0.1, 0.1)).toThrow(/clear of the ground/);
  });
});

describe('capacitanceTorusIsolated', () => {
  it('legendrePHalf / legendreQHalf match mpmath legenp / legenq (type 3) to 1e-12', () => {
    for (const { x, n, P, Q } of legendre.values) {
      const xi = Math.acosh(x);
      assertClose(legendrePHalf(n, xi), P, 1e-12, `P_(${n}−½)(${x})`);
      assertClose(legendreQHalf(n, xi), Q, 1e-12, `Q_(${n}−½)(${x})`);
    }
  });

  it('legendreQHalf(0, ξ)/legendrePHalf(0, ξ) is π/2 at cosh ξ = 3 (Landen)', () => {
    const xi = Math.acosh(3);
    assertClose(legendreQHalf(0, xi) / legendrePHalf(0, xi), Math.PI / 2, 1e-13, 'Q/P at 3');
  });

  it('capacitanceTorusIsolated(R, r) gives 31.10706 pF and 25.80047 pF for a 0.6 m torus read as centre-line and outside diameter (mpmath 1.3.0 toroidal-harmonic series)', () => {
    assertClose(capacitanceTorusIsolated(0.3, 0.075), 31.10706e-12, 2e-7, 'R = 0.3, r = 0.075');
    assertClose(capacitanceTorusIsolated(0.225, 0.075), 25.80047e-12, 2e-7, 'R = 0.225, r = 0.075');
  });

  it('capacitanceTorusIsolated(R, r) matches the mpmath toroidal-harmonic series to 1e-12', () => {
    for (const { R, r, C } of library.torusSeries) assertClose(capacitanceTorusIsolated(R, r), C, 1e-12, `torus(${R}, ${r})`);
  });

  it('capacitanceTorusIsolated(R, r) approaches the thin-torus limit 4π²ε0R/ln(8R/r)', () => {
    const R = 1;
    const r = 1e-4;
    assertClose(capacitanceTorusIsolated(R, r), (4 * Math.PI * Math.PI * EPSILON_0 * R) / Math.log((8 * R) / r), 1e-3, 'R/r = 1e4');
  });
});

describe('capacitanceToroidEmpirical', () => {
  it('capacitanceToroidEmpirical(D, d) (common practice) is within 10 % of the exact torus for d/D = 0.1…0.35', () => {
    // A loose check: the trade formula has no stated accuracy; this bounds it over typical proportions.
    for (const ratio of [0.1, 0.15, 0.2, 0.25, 0.3, 0.35]) {
      const D = 0.8;
      const d = ratio * D;
      const exact = capacitanceTorusIsolated((D - d) / 2, d / 2);
      assertClose(capacitanceToroidEmpirical(D, d), exact, 0.1, `d/D = ${ratio}`);
    }
  });
});

describe('capacitanceAxisymmetricBEM', () => {
  it('capacitanceAxisymmetricBEM(torus) matches the exact series within 0.01 % for both 0.6 m tori (mpmath 1.3.0 toroidal-harmonic series)', () => {
    assertClose(capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.3, r: 0.075, centreZ: 0 }), 31.10706e-12, 1e-4, 'R = 0.3');
    assertClose(capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.225, r: 0.075, centreZ: 2 }), 25.80047e-12, 1e-4, 'R = 0.225');
    for (const { R, r, C } of library.torusSeries) {
      assertClose(capacitanceAxisymmetricBEM({ kind: 'torus', R, r, centreZ: 0 }), C, 1e-4, `BEM torus(${R}, ${r})`);
    }
  });

  it('capacitanceAxisymmetricBEM(sphere) is 4πε0a isolated and matches the image series over a plane', () => {
    assertClose(capacitanceAxisymmetricBEM({ kind: 'sphere', radius: 0.15, centreZ: 0 }), capacitanceSphere(0.15), 1e-6, 'isolated');
    for (const { a, h, C } of library.sphereOverPlane) {
      assertClose(capacitanceAxisymmetricBEM({ kind: 'sphere', radius: a, centreZ: h }, { groundZ: 0 }), C, 1e-4, `sphere a=${a} h=${h}`);
    }
  });

  it('capacitanceAxisymmetricBEM(disk) is 8ε0a (closed form)', () => {
    assertClose(capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0 }), 8 * EPSILON_0 * 0.1, 1e-6, 'disk a = 0.1');
  });

  it('capacitanceAxisymmetricBEM(torus 1.0 m over ground) is 36.02267 pF (charge simulation with scipy 1.17.1 / numpy, independent computation)', () => {
    // scripts/fixtures/worked_examples.py: ring charges and ground images, a different discretisation
    assertClose(worked.torusOverGround.C, 36.02267e-12, 1e-6, 'fixture value');
    assertClose(
      capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.3, r: 0.075, centreZ: 1.0 }, { groundZ: 0 }),
      worked.torusOverGround.C,
      1e-4,
      'torus over ground',
    );
  });

  it('capacitanceAxisymmetricBEM(shape) changes by < 1e-4 when the default panel count is doubled', () => {
    const shapes = [
      { shape: { kind: 'torus', R: 0.3, r: 0.075, centreZ: 1 } as const, groundZ: 0 },
      { shape: { kind: 'torus', R: 0.25, r: 0.2, centreZ: 0.5 } as const, groundZ: 0 },
      { shape: { kind: 'torus', R: 0.5, r: 0.02, centreZ: 0 } as const, groundZ: null },
      { shape: { kind: 'sphere', radius: 0.2, centreZ: 0.25 } as const, groundZ: 0 },
      { shape: { kind: 'disk', radius: 0.2, centreZ: 0.05 } as const, groundZ: 0 },
    ];
    for (const { shape, groundZ } of shapes) {
      const base = capacitanceAxisymmetricBEM(shape, { groundZ });
      const fine = capacitanceAxisymmetricBEM(shape, { groundZ, panels: 2 * DEFAULT_PANELS[shape.kind] });
      assertClose(base, fine, 1e-4, `doubling panels for ${JSON.stringify(shape)}`);
    }
  });

  it('capacitanceAxisymmetricBEM(shape) rejects a body below the ground and bad panel counts', () => {
    expect(() => capacitanceAxisymmetricBEM({ kind: 'sphere', radius: 0.2, centreZ: 0.1 }, { groundZ: 0 })).toThrow(/clear of the ground/);
    expect(() => capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.1, r: 0.2, centreZ: 1 })).toThrow(/torus/);
    expect(() => capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0 }, { panels: 2.5 })).toThrow(/panel/);
  });
});

describe('toploadCapacitance', () => {
  it('toploadCapacitance(toroid) reads majorDiameter as the outside diameter (R = (D − d)/2)', () => {
    const c = toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75, minorDiameter: 0.15, centreHeightAboveGround: 1 });
    assertClose(c, 36.02267e-12, 1e-4, 'outside 0.75 m, tube 0.15 m, 1 m up');
    const iso = toploadCapacitance({ shape: 'toroid', majorDiameter: 0.6, minorDiameter: 0.15, centreHeightAboveGround: null });
    assertClose(iso, 25.80047e-12, 1e-4, 'outside 0.6 m, isolated');
  });

  it('toploadCapacitance(sphere) matches the image series and is memoised without changing the value', () => {
    const t = { shape: 'sphere', diameter: 0.3, centreHeightAboveGround: 1 } as const;
    const first = toploadCapacitance(t);
    assertClose(first, capacitanceSphereOverPlane(0.15, 1), 1e-4, 'sphere 0.3 m at 1 m');
    expect(toploadCapacitance({ ...t })).toBe(first);
  });

  it('toploadCapacitance(topload) is positive, finite and falls as the topload is raised (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 2, noNaN: true }),
        fc.double({ min: 0.05, max: 0.45, noNaN: true }),
        fc.double({ min: 0.01, max: 3, noNaN: true }),
        (D, ratio, clearance) => {
          const d = ratio * D;
          const low = toploadCapacitance({ shape: 'toroid', majorDiameter: D, minorDiameter: d, centreHeightAboveGround: d / 2 + clearance });
          const high = toploadCapacitance({ shape: 'toroid', majorDiameter: D, minorDiameter: d, centreHeightAboveGround: d / 2 + 2 * clearance });
          expect(Number.isFinite(low) && low > 0).toBe(true);
          expect(high).toBeLessThan(low);
          expect(high).toBeGreaterThan(capacitanceTorusIsolated((D - d) / 2, d / 2) * (1 - 1e-4));
        },
      ),
      { numRuns: 40 },
    );
  });

  it('toploadCapacitance(topload) names the problem for impossible geometry', () => {
    expect(() => toploadCapacitance({ shape: 'toroid', majorDiameter: 0.2, minorDiameter: 0.1, centreHeightAboveGround: 1 })).toThrow(/twice the minor/);
    expect(() => toploadCapacitance({ shape: 'sphere', diameter: 0.4, centreHeightAboveGround: 0.1 })).toThrow(/clear of the ground/);
  });
});
