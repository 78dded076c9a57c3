/**
 * Small dense linear algebra on row-major Float64Arrays, for the field model's matrices (tens to about a
 * hundred rows): LU with partial pivoting for several right-hand sides, Cholesky, the inverse of a lower
 * triangle, products, and the symmetric eigenvalue problem by cyclic Jacobi rotations.
 *
 * Methods: G. H. Golub & C. F. Van Loan, "Matrix Computations", 4th ed., 2013 (Alg. 3.4.1 LU with partial
 * pivoting, Alg. 4.2.1 Cholesky, §8.5 cyclic Jacobi), from memory. Every routine throws on a singular or
 * indefinite input rather than returning NaN.
 */

/** A row-major matrix: `data[i * cols + j]`. */
export interface Dense {
  rows: number;
  cols: number;
  data: Float64Array;
}

export function dense(rows: number, cols: number, data?: ArrayLike<number>): Dense {
  const d = new Float64Array(rows * cols);
  if (data) d.set(data);
  return { rows, cols, data: d };
}

/** The rows and columns of `a` named by `rowIdx` and `colIdx`, in that order. */
export function select(a: Dense, rowIdx: readonly number[], colIdx: readonly number[]): Dense {
  const out = dense(rowIdx.length, colIdx.length);
  for (let i = 0; i < rowIdx.length; i++) {
    const src = rowIdx[i] * a.cols;
    const dst = i * colIdx.length;
    for (let j = 0; j < colIdx.length; j++) out.data[dst + j] = a.data[src + colIdx[j]];
  }
  return out;
}

export function transpose(a: Dense): Dense {
  const out = dense(a.cols, a.rows);
  for (let i = 0; i < a.rows; i++) for (let j = 0; j < a.cols; j++) out.data[j * a.rows + i] = a.data[i * a.cols + j];
  return out;
}

export function multiply(a: Dense, b: Dense): Dense {
  if (a.cols !== b.rows) throw new RangeError('multiply: inner dimensions differ');
  const out = dense(a.rows, b.cols);
  const n = b.cols;
  for (let i = 0; i < a.rows; i++) {
    const row = i * n;
    for (let k = 0; k < a.cols; k++) {
      const f = a.data[i * a.cols + k];
      if (f === 0) continue;
      const bk = k * n;
      for (let j = 0; j < n; j++) out.data[row + j] += f * b.data[bk + j];
    }
  }
  return out;
}

/**
 * X with A·X = B for a square A, by LU factorisation with partial pivoting (A and B are left unchanged).
 *
 * @example solveMany(dense(2, 2, [2, 1, 1, 3]), dense(2, 1, [3, 5])).data // [0.8, 1.4]
 */
export function solveMany(a: Dense, b: Dense): Dense {
  const n = a.rows;
  if (a.cols !== n || b.rows !== n) throw new RangeError('solveMany: A must be square with as many rows as B');
  const m = b.cols;
  const lu = Float64Array.from(a.data);
  const x = Float64Array.from(b.data);
  for (let k = 0; k < n; k++) {
    let pivot = k;
    let best = Math.abs(lu[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(lu[i * n + k]);
      if (v > best) {
        best = v;
        pivot = i;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) throw new RangeError('linear system is singular');
    if (pivot !== k) {
      for (let j = 0; j < n; j++) {
        const t = lu[k * n + j];
        lu[k * n + j] = lu[pivot * n + j];
        lu[pivot * n + j] = t;
      }
      for (let j = 0; j < m; j++) {
        const t = x[k * m + j];
        x[k * m + j] = x[pivot * m + j];
        x[pivot * m + j] = t;
      }
    }
    const akk = lu[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = lu[i * n + k] / akk;
      if (f === 0) continue;
      lu[i * n + k] = f;
      for (let j = k + 1; j < n; j++) lu[i * n + j] -= f * lu[k * n + j];
      for (let j = 0; j < m; j++) x[i * m + j] -= f * x[k * m + j];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    const d = lu[i * n + i];
    for (let j = 0; j < m; j++) {
      let s = x[i * m + j];
      for (let k = i + 1; k < n; k++) s -= lu[i * n + k] * x[k * m + j];
      x[i * m + j] = s / d;
    }
  }
  return { rows: n, cols: m, data: x };
}

/** The lower triangle G with A = G·Gᵀ for a symmetric positive definite A; null when A is not positive definite. */
export function cholesky(a: Dense): Dense | null {
  const n = a.rows;
  const g = dense(n, n);
  for (let j = 0; j < n; j++) {
    let d = a.data[j * n + j];
    for (let k = 0; k < j; k++) d -= g.data[j * n + k] * g.data[j * n + k];
    if (!(d > 0)) return null;
    const gjj = Math.sqrt(d);
    g.data[j * n + j] = gjj;
    for (let i = j + 1; i < n; i++) {
      let s = a.data[i * n + j];
      for (let k = 0; k < j; k++) s -= g.data[i * n + k] * g.data[j * n + k];
      g.data[i * n + j] = s / gjj;
    }
  }
  return g;
}

/** The inverse of a lower triangle with a non-zero diagonal, by forward substitution (again lower triangular). */
export function invertLower(g: Dense): Dense {
  const n = g.rows;
  const out = dense(n, n);
  for (let c = 0; c < n; c++) {
    for (let i = c; i < n; i++) {
      let s = i === c ? 1 : 0;
      for (let k = c; k < i; k++) s -= g.data[i * n + k] * out.data[k * n + c];
      const d = g.data[i * n + i];
      if (d === 0) throw new RangeError('triangular matrix is singular');
      out.data[i * n + c] = s / d;
    }
  }
  return out;
}

/**
 * Eigenvalues and eigenvectors of a symmetric matrix by cyclic Jacobi rotations, swept until every
 * off-diagonal element is below the rounding of the diagonal elements it joins. `vectors` holds the eigenvector of `values[k]` in
 * column k, each of unit length; the values are in no particular order.
 *
 * @example symmetricEigen(dense(2, 2, [2, 1, 1, 2])).values // [1, 3] in some order
 */
export function symmetricEigen(a: Dense, maxSweeps = 60): { values: Float64Array; vectors: Dense } {
  const n = a.rows;
  const m = Float64Array.from(a.data);
  const v = dense(n, n);
  for (let i = 0; i < n; i++) v.data[i * n + i] = 1;
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    let off = 0;
    let diag = 0;
    for (let p = 0; p < n; p++) {
      diag += m[p * n + p] * m[p * n + p];
      for (let q = p + 1; q < n; q++) off += m[p * n + q] * m[p * n + q];
    }
    if (off === 0 || off <= 1e-40 * diag) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q];
        if (apq === 0) continue;
        const app = m[p * n + p];
        const aqq = m[q * n + q];
        const g = 100 * Math.abs(apq);
        if (Math.abs(app) + g === Math.abs(app) && Math.abs(aqq) + g === Math.abs(aqq)) {
          // below the diagonal's rounding: set to zero instead of rotating
          m[p * n + q] = 0;
          m[q * n + p] = 0;
          continue;
        }
        // the rotation that zeroes m[p][q]: t = tan θ, the smaller root of t² + 2τt − 1 = 0
        const tau = (aqq - app) / (2 * apq);
        const t = (tau >= 0 ? 1 : -1) / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const mkp = m[k * n + p];
          const mkq = m[k * n + q];
          m[k * n + p] = c * mkp - s * mkq;
          m[k * n + q] = s * mkp + c * mkq;
        }
        for (let k = 0; k < n; k++) {
          const mpk = m[p * n + k];
          const mqk = m[q * n + k];
          m[p * n + k] = c * mpk - s * mqk;
          m[q * n + k] = s * mpk + c * mqk;
        }
        m[p * n + q] = 0;
        m[q * n + p] = 0;
        for (let k = 0; k < n; k++) {
          const vkp = v.data[k * n + p];
          const vkq = v.data[k * n + q];
          v.data[k * n + p] = c * vkp - s * vkq;
          v.data[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = m[i * n + i];
  return { values, vectors: v };
}
