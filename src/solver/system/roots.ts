/**
 * Root of g on [lo, hi]: the first sign change among `samples` evenly spaced points, then Illinois
 * (modified regula falsi) inside it. Points where g is not finite are skipped while bracketing.
 * Returns null when no sign change is found.
 */
export function findRoot(g: (x: number) => number, lo: number, hi: number, samples = 24, tolerance = 1e-12): number | null {
  let a = lo;
  let ga = g(lo);
  if (ga === 0) return lo;
  let bracket: [number, number, number, number] | null = null;
  for (let i = 1; i <= samples; i++) {
    const x = lo + ((hi - lo) * i) / samples;
    const gx = g(x);
    if (!Number.isFinite(gx)) continue;
    if (gx === 0) return x;
    if (Number.isFinite(ga) && Math.sign(gx) !== Math.sign(ga)) {
      bracket = [a, ga, x, gx];
      break;
    }
    a = x;
    ga = gx;
  }
  if (!bracket) return null;
  let [x0, g0, x1, g1] = bracket;
  let side = 0;
  for (let i = 0; i < 200; i++) {
    let x = (x0 * g1 - x1 * g0) / (g1 - g0);
    if (!(x > Math.min(x0, x1) && x < Math.max(x0, x1))) x = 0.5 * (x0 + x1);
    const gx = g(x);
    if (!Number.isFinite(gx)) return null;
    if (gx === 0 || Math.abs(x1 - x0) <= tolerance * Math.max(1, Math.abs(x))) return x;
    if (Math.sign(gx) === Math.sign(g0)) {
      x0 = x;
      g0 = gx;
      if (side === -1) g1 /= 2;
      side = -1;
    } else {
      x1 = x;
      g1 = gx;
      if (side === 1) g0 /= 2;
      side = 1;
    }
  }
  return (x0 * g1 - x1 * g0) / (g1 - g0);
}
