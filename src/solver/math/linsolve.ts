/**
 * Solves the dense linear system A·x = b in place by Gaussian elimination with partial pivoting.
 *
 * `a` is row-major n×n and is overwritten by its LU factors; `b` is overwritten by x, which is also
 * returned. Method: textbook LU with row pivoting (G. H. Golub & C. F. Van Loan, "Matrix
 * Computations", 4th ed., 2013, Alg. 3.4.1, from memory). Throws when the matrix is singular to
 * working precision, so a degenerate geometry never turns into NaN silently.
 *
 * @example solveDense(Float64Array.of(2, 1, 1, 3), Float64Array.of(3, 5), 2) // [0.8, 1.4]
 */
export function solveDense(a: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let k = 0; k < n; k++) {
    let pivot = k;
    let best = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > best) {
        best = v;
        pivot = i;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) throw new RangeError('linear system is singular');
    if (pivot !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j];
        a[k * n + j] = a[pivot * n + j];
        a[pivot * n + j] = t;
      }
      const t = b[k];
      b[k] = b[pivot];
      b[pivot] = t;
    }
    const akk = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = a[i * n + k] / akk;
      if (f === 0) continue;
      a[i * n + k] = f;
      for (let j = k + 1; j < n; j++) a[i * n + j] -= f * a[k * n + j];
      b[i] -= f * b[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= a[i * n + j] * b[j];
    b[i] = s / a[i * n + i];
  }
  return b;
}
