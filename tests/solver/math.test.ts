import ellipeStdlib from '@stdlib/math-base-special-ellipe';
import ellipkStdlib from '@stdlib/math-base-special-ellipk';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ellipKComplementary,
  ellipKE,
  ellipKEComplementary,
  ellipKMinusE,
  ellipMaxwellCombination,
} from '../../src/solver/math/ellip';
import { gaussLegendre, integrateGauss } from '../../src/solver/math/gauss';
import { solveDense } from '../../src/solver/math/linsolve';
import { pchip } from '../../src/solver/math/pchip';
import { assertClose } from '../helpers/assertClose';
import ellipFixture from './fixtures/ellip.json';

describe('ellipKE', () => {
  it('ellipKE(m) matches scipy ellipk/ellipe over −10 ≤ m ≤ 0.9999 to 1e-14', () => {
    for (const { m, K, E } of ellipFixture.byParameter) {
      const got = ellipKE(m);
      assertClose(got.K, K, 1e-14, `ellipKE(${m}).K vs scipy ellipk`);
      assertClose(got.E, E, 1e-14, `ellipKE(${m}).E vs scipy ellipe`);
    }
  });

  it('ellipKEComplementary(mc) matches scipy ellipkm1 and mpmath ellipe as m → 1 (mc down to 1e-300)', () => {
    for (const { mc, K, E } of ellipFixture.byComplement) {
      const got = ellipKEComplementary(mc);
      assertClose(got.K, K, 1e-14, `ellipKEComplementary(${mc}).K vs scipy ellipkm1`);
      assertClose(got.E, E, 1e-14, `ellipKEComplementary(${mc}).E vs mpmath ellipe`);
      assertClose(ellipKComplementary(mc), K, 1e-14, `ellipKComplementary(${mc}) vs scipy ellipkm1`);
    }
  });

  it('ellipKE(m) agrees with @stdlib ellipk/ellipe to 1e-13 for random m in [−5, 0.999999] (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 0.999999, noNaN: true }), (m) => {
        const { K, E } = ellipKE(m);
        assertClose(K, ellipkStdlib(m), 1e-13, `ellipKE(${m}).K vs @stdlib ellipk`);
        assertClose(E, ellipeStdlib(m), 1e-13, `ellipKE(${m}).E vs @stdlib ellipe`);
      }),
      { numRuns: 500 },
    );
  });

  it('ellipKE(m) satisfies Legendre\'s relation EK′ + E′K − KK′ = π/2 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (m) => {
        const a = ellipKE(m);
        const b = ellipKEComplementary(m);
        assertClose(a.E * b.K + b.E * a.K - a.K * b.K, Math.PI / 2, 1e-13, `Legendre relation at m=${m}`);
      }),
      { numRuns: 300 },
    );
  });

  it('ellipKE(1) is { K: Infinity, E: 1 } and ellipKE(m > 1) is NaN', () => {
    expect(ellipKE(1)).toEqual({ K: Infinity, E: 1 });
    expect(Number.isNaN(ellipKE(1.5).K)).toBe(true);
    expect(Number.isNaN(ellipKE(Number.NaN).E)).toBe(true);
  });

  it('ellipKMinusE(m) keeps full accuracy for small m (series πm/4·(1 + 3m/8))', () => {
    for (const m of [1e-12, 1e-9, 1e-6]) {
      assertClose(ellipKMinusE(m), (Math.PI * m) / 4 * (1 + (3 * m) / 8), 1e-11, `ellipKMinusE(${m})`);
    }
    const { K, E } = ellipKE(0.3);
    assertClose(ellipKMinusE(0.3), K - E, 1e-14, 'ellipKMinusE(0.3) vs K − E');
  });

  it('ellipMaxwellCombination(m, 1 − m) tends to πm²/32·(1 + 3m/4) for distant filaments', () => {
    for (const m of [1e-10, 1e-7, 1e-5]) {
      assertClose(ellipMaxwellCombination(m, 1 - m), ((Math.PI * m * m) / 32) * (1 + 0.75 * m), 1e-9, `ellipMaxwellCombination(${m})`);
    }
    const { K, E } = ellipKE(0.7);
    assertClose(ellipMaxwellCombination(0.7, 0.3), (1 - 0.35) * K - E, 1e-13, 'ellipMaxwellCombination(0.7) vs direct');
  });
});

describe('gaussLegendre', () => {
  it('gaussLegendre(n) integrates polynomials of degree 2n − 1 exactly and its weights sum to 2', () => {
    for (const n of [1, 2, 4, 8, 16]) {
      const { w } = gaussLegendre(n);
      assertClose(w.reduce((s, v) => s + v, 0), 2, 1e-14, `sum of weights, n=${n}`);
      const deg = 2 * n - 1;
      assertClose(integrateGauss((t) => Math.pow(t, deg - 1) * (deg + 1), 0, 1, n), (deg + 1) / deg, 1e-13, `∫ t^${deg - 1}, n=${n}`);
    }
  });

  it('gaussLegendre(2) has nodes ±1/√3 (closed form)', () => {
    const { x } = gaussLegendre(2);
    assertClose(x[1], 1 / Math.sqrt(3), 1e-15, 'node of the 2-point rule');
  });
});

describe('solveDense', () => {
  it('solveDense(A, b) solves a system that needs pivoting', () => {
    const x = solveDense(Float64Array.of(0, 2, 1, 1, 1, 1, 2, 1, 3), Float64Array.of(5, 6, 14), 3);
    assertClose(x[0], 2, 1e-14, 'x0');
    assertClose(x[1], 1, 1e-14, 'x1');
    assertClose(x[2], 3, 1e-14, 'x2');
  });

  it('solveDense(A, b) throws on a singular matrix', () => {
    expect(() => solveDense(Float64Array.of(1, 2, 2, 4), Float64Array.of(1, 2), 2)).toThrow(/singular/);
  });
});

describe('pchip', () => {
  it('pchip(xs, ys) reproduces the knots and never overshoots monotone data', () => {
    const f = pchip([0, 1, 2, 3], [0, 0, 1, 1]);
    expect(f(1)).toBe(0);
    expect(f(2)).toBe(1);
    for (let x = 0; x <= 3; x += 0.05) {
      expect(f(x)).toBeGreaterThanOrEqual(-1e-15);
      expect(f(x)).toBeLessThanOrEqual(1 + 1e-15);
    }
  });
});
