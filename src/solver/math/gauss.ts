/**
 * Gauss–Legendre quadrature nodes and weights on [−1, 1].
 *
 * Method: Newton iteration on the Legendre polynomial P_n from the Tricomi initial guess, with the
 * three-term recurrence for P_n and its derivative (Golub & Welsch, "Calculation of Gauss quadrature
 * rules", Math. Comp. 23, 1969, give the equivalent eigenvalue method; from memory). Results are
 * cached per order because the solver asks for the same few orders on every call.
 *
 * Domain: integer n ≥ 1. Exact for polynomials up to degree 2n − 1.
 * @example gaussLegendre(2) // { x: [−0.5773502691896257, 0.5773502691896257], w: [1.0000000000000002, 1.0000000000000002] }
 */
export function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const cached = cache.get(n);
  if (cached) return cached;
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`Gauss–Legendre order must be a positive integer, got ${n}`);
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let t = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = t;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * t * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? t : p1;
      const pnm1 = n === 1 ? 1 : p0;
      dp = (n * (t * pn - pnm1)) / (t * t - 1);
      const dt = pn / dp;
      t -= dt;
      if (Math.abs(dt) < 1e-16) break;
    }
    // Recompute the derivative at the converged node for the weight.
    let p0 = 1;
    let p1 = t;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * t * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    const pn = n === 1 ? t : p1;
    const pnm1 = n === 1 ? 1 : p0;
    dp = (n * (t * pn - pnm1)) / (t * t - 1);
    x[n - 1 - i] = t;
    w[n - 1 - i] = 2 / ((1 - t * t) * dp * dp);
  }
  const rule = { x, w };
  cache.set(n, rule);
  return rule;
}

const cache = new Map<number, { x: Float64Array; w: Float64Array }>();

/**
 * ∫_a^b f(t) dt by an n-point Gauss–Legendre rule. Exact for polynomials of degree ≤ 2n − 1.
 * @example integrateGauss((t) => t * t, 0, 1, 4) // 0.33333333333333326
 */
export function integrateGauss(f: (t: number) => number, a: number, b: number, n: number): number {
  const { x, w } = gaussLegendre(n);
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  let sum = 0;
  for (let i = 0; i < n; i++) sum += w[i] * f(mid + half * x[i]);
  return sum * half;
}
