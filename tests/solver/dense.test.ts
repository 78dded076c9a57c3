import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { cholesky, dense, invertLower, multiply, select, solveMany, symmetricEigen, transpose, type Dense } from '~/solver/math/dense';

/** A general-purpose library (ml-matrix) as the reference for the field model's own dense routines. */
const toMl = (a: Dense) => Matrix.from1DArray(a.rows, a.cols, Array.from(a.data));
const maxAbs = (xs: ArrayLike<number>) => Array.from(xs).reduce((m, x) => Math.max(m, Math.abs(x)), 0);

const entries = (n: number) => fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: n * n, maxLength: n * n });
/** A symmetric positive definite matrix: R·Rᵀ plus a diagonal that keeps it well away from singular. */
const spd = fc.integer({ min: 1, max: 24 }).chain((n) =>
  entries(n).map((r) => {
    const R = dense(n, n, r);
    const A = multiply(R, transpose(R));
    for (let i = 0; i < n; i++) A.data[i * n + i] += 0.5 + i * 0.1;
    return A;
  }),
);
const square = fc.integer({ min: 1, max: 24 }).chain((n) =>
  fc.tuple(entries(n), fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 3 * n, maxLength: 3 * n })).map(([a, b]) => {
    const A = dense(n, n, a);
    for (let i = 0; i < n; i++) A.data[i * n + i] += n; // diagonally dominant: well conditioned
    return { A, B: dense(n, 3, b) };
  }),
);

describe('dense linear algebra (math/dense.ts) against ml-matrix', () => {
  it('solveMany gives the solution ml-matrix gives, for several right-hand sides (fast-check)', () => {
    fc.assert(
      fc.property(square, ({ A, B }) => {
        const X = solveMany(A, B);
        const ref = solve(toMl(A), toMl(B)).to1DArray();
        for (let i = 0; i < ref.length; i++) expect(Math.abs(X.data[i] - ref[i])).toBeLessThan(1e-12 * Math.max(1, maxAbs(ref)));
        // and A·X = B
        const AX = multiply(A, X);
        for (let i = 0; i < B.data.length; i++) expect(Math.abs(AX.data[i] - B.data[i])).toBeLessThan(1e-12 * A.rows);
      }),
      { numRuns: 200 },
    );
  });

  it('cholesky and invertLower give ml-matrix’s triangle and its inverse; an indefinite matrix gives null', () => {
    fc.assert(
      fc.property(spd, (A) => {
        const G = cholesky(A)!;
        const ref = new CholeskyDecomposition(toMl(A)).lowerTriangularMatrix.to1DArray();
        for (let i = 0; i < ref.length; i++) expect(Math.abs(G.data[i] - ref[i])).toBeLessThan(1e-12 * Math.max(1, maxAbs(ref)));
        const I = multiply(invertLower(G), G);
        for (let i = 0; i < A.rows; i++) for (let j = 0; j < A.rows; j++) expect(Math.abs(I.data[i * A.rows + j] - (i === j ? 1 : 0))).toBeLessThan(1e-10);
      }),
      { numRuns: 200 },
    );
    expect(cholesky(dense(2, 2, [1, 2, 2, 1]))).toBeNull();
  });

  it('symmetricEigen gives ml-matrix’s eigenvalues, with unit eigenvectors that satisfy A·v = λ·v (fast-check)', () => {
    fc.assert(
      fc.property(spd, (A) => {
        const n = A.rows;
        const { values, vectors } = symmetricEigen(A);
        const ref = new EigenvalueDecomposition(toMl(A), { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
        const mine = Array.from(values).sort((a, b) => a - b);
        const scale = maxAbs(ref);
        for (let i = 0; i < n; i++) expect(Math.abs(mine[i] - ref[i])).toBeLessThan(1e-12 * scale);
        for (let k = 0; k < n; k++) {
          const v = select(vectors, Array.from({ length: n }, (_, i) => i), [k]);
          const Av = multiply(A, v);
          expect(Math.abs(Math.hypot(...v.data) - 1)).toBeLessThan(1e-12);
          for (let i = 0; i < n; i++) expect(Math.abs(Av.data[i] - values[k] * v.data[i])).toBeLessThan(1e-11 * scale);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('solveMany refuses a singular matrix rather than returning NaN', () => {
    expect(() => solveMany(dense(2, 2, [1, 2, 2, 4]), dense(2, 1, [1, 1]))).toThrow(/singular/);
  });
});
