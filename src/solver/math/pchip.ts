/**
 * Shape-preserving piecewise cubic Hermite interpolation (PCHIP).
 *
 * Returns an interpolant through (xs[i], ys[i]) with xs strictly increasing. Method: Fritsch &
 * Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 1980, with the
 * weighted-harmonic-mean slopes and one-sided three-point end slopes of Fritsch & Butland (1984) as
 * used by scipy.interpolate.PchipInterpolator (from memory; tests compare with scipy). It never
 * overshoots the data between two knots and keeps local extrema at knots.
 *
 * Domain: xs[0] ≤ x ≤ xs[n−1]; outside, the caller decides how to extrapolate.
 * @example pchip([0, 1, 2], [0, 1, 4])(1.5) // 2.1875
 */
export function pchip(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError('pchip needs at least two points and equal lengths');
  const h: number[] = [];
  const delta: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(xs[i + 1] - xs[i]);
    delta.push((ys[i + 1] - ys[i]) / h[i]);
  }
  const d = new Array<number>(n).fill(0);
  if (n === 2) {
    d[0] = d[1] = delta[0];
  } else {
    for (let i = 1; i < n - 1; i++) {
      if (delta[i - 1] * delta[i] > 0) {
        const w1 = 2 * h[i] + h[i - 1];
        const w2 = h[i] + 2 * h[i - 1];
        d[i] = (w1 + w2) / (w1 / delta[i - 1] + w2 / delta[i]);
      }
    }
    d[0] = endSlope(h[0], h[1], delta[0], delta[1]);
    d[n - 1] = endSlope(h[n - 2], h[n - 3], delta[n - 2], delta[n - 3]);
  }
  return (x: number): number => {
    let lo = 0;
    let hi = n - 2;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid - 1;
    }
    const i = lo;
    const t = (x - xs[i]) / h[i];
    const t2 = t * t;
    const t3 = t2 * t;
    return (
      (2 * t3 - 3 * t2 + 1) * ys[i] +
      (t3 - 2 * t2 + t) * h[i] * d[i] +
      (-2 * t3 + 3 * t2) * ys[i + 1] +
      (t3 - t2) * h[i] * d[i + 1]
    );
  };
}

function endSlope(h0: number, h1: number, m0: number, m1: number): number {
  const d = ((2 * h0 + h1) * m0 - h0 * m1) / (h0 + h1);
  if (Math.sign(d) !== Math.sign(m0)) return 0;
  if (Math.sign(m0) !== Math.sign(m1) && Math.abs(d) > Math.abs(3 * m0)) return 3 * m0;
  return d;
}
