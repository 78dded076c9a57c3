/** Inductance an LC circuit needs to resonate at f with capacitance C: L = 1/((2πf)² C). */
export function inductanceForResonance(frequency: number, capacitance: number): number {
  const w = 2 * Math.PI * frequency;
  return 1 / (w * w * capacitance);
}

/** Capacitance an LC circuit needs to resonate at f with inductance L. */
export function capacitanceForResonance(frequency: number, inductance: number): number {
  const w = 2 * Math.PI * frequency;
  return 1 / (w * w * inductance);
}

export interface TapSolution {
  /** turns in circuit from the inner end; null when the target lies outside [minTurns, maxTurns] */
  tapTurns: number | null;
  inRange: boolean;
}

/**
 * Finds the tap t in [minTurns, maxTurns] at which inductanceAt(t) equals `required`.
 * Method: Illinois (modified regula falsi) on √L(t) − √L_required, which is close to linear in t
 * because a coil's inductance grows roughly as the square of its turns; bisection guards each step.
 * Assumes inductanceAt is increasing in t (more turns in circuit, more inductance).
 * Converges to |Δt| < tolerance (default 1e-9 turn) in typically 5–8 evaluations.
 */
export function solveTap(
  inductanceAt: (turns: number) => number,
  required: number,
  minTurns: number,
  maxTurns: number,
  tolerance = 1e-9,
): TapSolution {
  const g = (t: number) => Math.sqrt(inductanceAt(t)) - Math.sqrt(required);
  let a = minTurns;
  let b = maxTurns;
  let ga = g(a);
  let gb = g(b);
  if (!Number.isFinite(ga) || !Number.isFinite(gb)) return { tapTurns: null, inRange: false };
  if (ga === 0) return { tapTurns: a, inRange: true };
  if (gb === 0) return { tapTurns: b, inRange: true };
  if (ga > 0 || gb < 0) return { tapTurns: null, inRange: false };

  let side = 0;
  for (let i = 0; i < 100; i++) {
    let t = (a * gb - b * ga) / (gb - ga);
    if (!(t > a && t < b)) t = 0.5 * (a + b);
    const gt = g(t);
    if (!Number.isFinite(gt)) return { tapTurns: null, inRange: false };
    if (Math.abs(gt) <= 1e-13 * Math.sqrt(required) || b - a < tolerance) return { tapTurns: t, inRange: true };
    if (gt < 0) {
      a = t;
      ga = gt;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      b = t;
      gb = gt;
      if (side === 1) ga /= 2;
      side = 1;
    }
    if (Math.abs(b - a) < tolerance) break;
  }
  return { tapTurns: (a * gb - b * ga) / (gb - ga), inRange: true };
}
