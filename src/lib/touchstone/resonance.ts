import type { Sweep } from './types';

export type ResonanceMode = 'peak' | 'dip';

export interface Resonance {
  kind: ResonanceMode;
  /** interpolated centre frequency, Hz */
  frequency: number;
  /** magnitude at the sampled extreme, linear and in dB */
  magnitude: number;
  levelDb: number;
  /** half-power crossings, Hz; null when the trace ends before the response falls to half power */
  lowerHalfPower: number | null;
  upperHalfPower: number | null;
  /** f0 / (upper − lower); null without both crossings */
  q: number | null;
}

export interface ResonanceOptions {
  /** default: decided from the trace's shape (a dip for one-port reflection) */
  mode?: ResonanceMode;
  /** the most resonances to return, strongest first (default 5) */
  max?: number;
  /** ignore extremes weaker than this fraction of the strongest (default 0.2) */
  minRelative?: number;
}

/**
 * Finds the resonances of a swept response: peaks of a transmission, dips of a reflection.
 *
 * Method. A peak is analysed on the power p = |A|²; a dip on the absorbed power 1 − |A|²/p_ref, where
 * p_ref = 1 for a passive S-parameter (|S| ≤ 1) and the largest sampled power otherwise. Each local
 * maximum of that curve above `minRelative` of the strongest is a candidate; its frequency is the
 * vertex of the parabola through the sample and its two neighbours (three-point interpolation,
 * exact for a quadratic), and its bandwidth the distance between the half-power crossings on either
 * side, each interpolated linearly between the two samples that straddle half the candidate's
 * value. Q = f0 / bandwidth. For a series RLC in a 50 Ω system both curves are Lorentzians in the
 * reactance, so the half-power width equals the loaded bandwidth f0/Q_L exactly (W. H. Hayt & J. E.
 * Kemmerly, "Engineering Circuit Analysis", §16, series resonance; D. M. Pozar, "Microwave
 * Engineering", 4th ed., 2012, §6.1, loaded Q). Candidates inside a stronger one's half-power band
 * are dropped.
 */
export function findResonances(sweep: Sweep, options: ResonanceOptions = {}): { mode: ResonanceMode; resonances: Resonance[] } {
  const { frequency: f, magnitude: a } = sweep;
  const n = Math.min(f.length, a.length);
  const mode = options.mode ?? guessMode(sweep);
  const power = a.slice(0, n).map((x) => x * x);
  const ref = sweep.passive ? Math.max(1, ...power) : Math.max(...power);
  const y = mode === 'peak' ? power : power.map((p) => (ref > 0 ? 1 - p / ref : 0));
  const yMax = Math.max(...y);
  if (!(yMax > 0)) return { mode, resonances: [] };

  const candidates: number[] = [];
  for (let i = 1; i < n - 1; i++) {
    if (y[i] >= y[i - 1] && y[i] > y[i + 1] && y[i] >= (options.minRelative ?? 0.2) * yMax) candidates.push(i);
  }
  candidates.sort((i, j) => y[j] - y[i]);

  const found: Resonance[] = [];
  for (const i of candidates) {
    if (found.length >= (options.max ?? 5)) break;
    const f0 = vertex(f[i - 1], y[i - 1], f[i], y[i], f[i + 1], y[i + 1]);
    const half = y[i] / 2;
    const lower = crossing(f, y, i, -1, half);
    const upper = crossing(f, y, i, 1, half);
    const overlaps = found.some((r) => r.lowerHalfPower !== null && r.upperHalfPower !== null && f0 >= r.lowerHalfPower && f0 <= r.upperHalfPower);
    if (overlaps) continue;
    found.push({
      kind: mode,
      frequency: f0,
      magnitude: a[i],
      levelDb: 20 * Math.log10(Math.max(a[i], 1e-12)),
      lowerHalfPower: lower,
      upperHalfPower: upper,
      q: lower !== null && upper !== null && upper > lower ? f0 / (upper - lower) : null,
    });
  }
  return { mode, resonances: found };
}

/** A reflection (S11, S22) resonates as a dip, a transmission (S21, S12) as a peak; otherwise the larger excursion from the median decides. */
export function guessMode(sweep: Sweep): ResonanceMode {
  if (/^S(11|22)$/.test(sweep.label)) return 'dip';
  if (/^S(21|12)$/.test(sweep.label)) return 'peak';
  const db = sweep.magnitude.map((x) => 20 * Math.log10(Math.max(x, 1e-12)));
  const sorted = [...db].sort((p, q) => p - q);
  const median = sorted[Math.floor(sorted.length / 2)];
  return sorted[sorted.length - 1] - median >= median - sorted[0] ? 'peak' : 'dip';
}

function vertex(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): number {
  const d = (x0 - x1) * (x0 - x2) * (x1 - x2);
  const A = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / d;
  const B = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / d;
  if (!(A < 0) || !Number.isFinite(B)) return x1;
  const v = -B / (2 * A);
  return v > x0 && v < x2 ? v : x1;
}

/** Walks from sample i in direction dir until y falls below `level`; null if the trace ends or rises above y[i] first. */
function crossing(f: number[], y: number[], i: number, dir: -1 | 1, level: number): number | null {
  for (let j = i + dir; j >= 0 && j < y.length; j += dir) {
    if (y[j] > y[i]) return null;
    if (y[j] <= level) {
      const k = j - dir;
      const t = (y[k] - level) / (y[k] - y[j]);
      return f[k] + t * (f[j] - f[k]);
    }
  }
  return null;
}
