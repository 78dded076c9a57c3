import { resonantFrequencyLC } from './secondary/resonance';
import type { DesignSI } from './types';
import { checkDesign } from './system/checks';
import { evaluateSecondary } from './system/secondary';
import { evaluateTopload } from './system/topload';
import { evaluateCoupling, evaluatePrimary, primaryInductanceAtTap } from './system/primary';
import { findRoot } from './system/roots';
import { capacitanceForResonance } from './tuning/tap';
import { evaluateTank } from './tank/evaluate';
import { closeWoundLength, primaryParams, secondarySheet, windingDiameter, windingLength } from './system/geometry';
import { primaryRings } from './primary/geometry';
import { mutualInductanceLoops } from './primary/inductance';
import { gaussLegendre } from './math/gauss';
import { evaluateFieldModel } from './field/model';

const MAX_TURNS = 20000;
const MAX_WINDING_LENGTH = 10;

/** Lumped estimate of the loaded frequency (Medhurst self-capacitance + topload alone + streamer allowance). */
export function lumpedLoadedFrequency(d: DesignSI): number {
  const sv = evaluateSecondary(d.secondary);
  const ct = d.topload ? evaluateTopload(d, d.topload).capacitance : 0;
  return resonantFrequencyLC(sv.inductance, sv.selfCapacitance + ct + d.tuning.streamerCapacitance);
}

/** Loaded frequency of a design (secondary + topload + streamer allowance) by the field model, the quantity the inverses aim at. */
export function loadedFrequency(d: DesignSI): number {
  const sv = evaluateSecondary(d.secondary);
  return evaluateFieldModel(d, sv.inductance).frequencyWithTopCapacitance(d.tuning.streamerCapacitance);
}

/**
 * Root of ln f(x) − ln f_target for the field model's f, found cheaply: the field model changes the lumped
 * estimate by a ratio that varies slowly with any one input, so the lumped model (with the ratio held) is
 * solved, the ratio is re-evaluated at the answer, and this repeats until the field frequency is within 1e-5.
 */
function solveWithFieldRatio(at: (x: number) => DesignSI, targetHz: number, lo: number, hi: number, iterations: number): number | null {
  let ratio = 1;
  let x: number | null = null;
  for (let pass = 0; pass < 6; pass++) {
    const held = ratio;
    x = findRoot((u) => Math.log(lumpedLoadedFrequency(at(u)) * held) - Math.log(targetHz), lo, hi, iterations);
    if (x === null) return null;
    const d = at(x);
    const field = loadedFrequency(d);
    if (Math.abs(field / targetHz - 1) < 1e-5) return x;
    ratio = field / lumpedLoadedFrequency(d);
  }
  return x;
}

function withSecondary(d: DesignSI, patch: Partial<DesignSI['secondary']>): DesignSI {
  return { ...d, secondary: { ...d.secondary, ...patch } };
}

/**
 * Secondary turns (fractional) that put the loaded frequency, including tuning.streamerCapacitance, at
 * `targetHz`. A close-wound design keeps its winding close-wound (the length follows the turns); a
 * fixed winding length stays fixed and limits the turns that fit. Method: Illinois root finding on
 * ln f(N) − ln f_target over ln N. Returns null when no turn count in range reaches the target.
 */
export function turnsForFrequency(d: DesignSI, targetHz: number): { turns: number; windingLength: number } | null {
  const s = d.secondary;
  const maxTurns = s.windingLength === null ? MAX_TURNS : Math.min(MAX_TURNS, s.windingLength / s.wire.insulatedDiameter);
  if (!(maxTurns >= 1)) return null;
  const lnN = solveWithFieldRatio((lnN) => withSecondary(d, { turns: Math.exp(lnN) }), targetHz, 0, Math.log(maxTurns), 32);
  if (lnN === null) return null;
  const turns = Math.exp(lnN);
  return { turns, windingLength: windingLength({ ...s, turns }) };
}

/**
 * Winding length that puts the loaded frequency at `targetHz` with the turns fixed, from close-wound
 * up to 10 m. Returns null when no length in that range reaches the target.
 */
export function windingLengthForFrequency(d: DesignSI, targetHz: number): number | null {
  const lo = closeWoundLength(d.secondary);
  if (!(lo < MAX_WINDING_LENGTH)) return null;
  const lnL = solveWithFieldRatio((lnL) => withSecondary(d, { windingLength: Math.exp(lnL) }), targetHz, Math.log(lo), Math.log(MAX_WINDING_LENGTH), 40);
  return lnL === null ? null : Math.exp(lnL);
}

/**
 * Tank capacitance that makes the primary, tapped at `tapTurns` from its inner end, resonate at the
 * tuning target frequency: C = 1/((2π f)² L1(tap)). Null without a primary.
 */
export function tankCapacitanceForTap(d: DesignSI, tapTurns: number): number | null {
  if (!d.primary) return null;
  return capacitanceForResonance(loadedFrequency(d), primaryInductanceAtTap(d.primary, tapTurns));
}

/**
 * H(d) = ∫₀^d M(a, b, t) dt for one primary ring against one filament of the secondary sheet (M: Maxwell's
 * mutual inductance of coaxial circles), tabulated once with its derivative M on graded Gauss–Legendre
 * panels (each no longer than the distance to the integrand's nearest complex singularity, as in
 * mutualInductanceRingSheet) and read back by cubic Hermite interpolation. H is odd in d. The ring–sheet
 * mutual inductance for any sheet position is then (N/ℓ)[H(z₀ + ℓ − z) − H(z₀ − z)] at the cost of two
 * table look-ups: the cheap model the elevation search runs on.
 */
class RingSheetTable {
  private readonly xs: number[] = [0];
  private readonly hs: number[] = [0];
  private readonly ms: number[];

  constructor(
    private readonly a: number,
    private readonly b: number,
    dMax: number,
  ) {
    const gap = Math.abs(a - b);
    const floor = 1e-6 * Math.min(a, b);
    const { x, w } = PANEL_RULE;
    this.ms = [Math.min(mutualInductanceLoops(a, b, Math.max(0, gap < floor ? floor : 0)), Number.MAX_VALUE)];
    let lo = 0;
    let total = 0;
    while (lo < dMax) {
      const hi = Math.min(dMax, lo + Math.max(Math.hypot(lo, gap), floor));
      const half = 0.5 * (hi - lo);
      let sum = 0;
      for (let k = 0; k < x.length; k++) sum += w[k] * mutualInductanceLoops(a, b, lo + half * (x[k] + 1));
      total += sum * half;
      this.xs.push(hi);
      this.hs.push(total);
      this.ms.push(mutualInductanceLoops(a, b, hi));
      lo = hi;
    }
  }

  /** H(d), odd in d. */
  at(d: number): number {
    if (d < 0) return -this.at(-d);
    const xs = this.xs;
    let i = 0;
    let j = xs.length - 1;
    if (d >= xs[j]) return this.hs[j];
    while (j - i > 1) {
      const m = (i + j) >> 1;
      if (xs[m] <= d) i = m;
      else j = m;
    }
    const h = xs[j] - xs[i];
    const t = (d - xs[i]) / h;
    const t2 = t * t;
    const t3 = t2 * t;
    return (
      (2 * t3 - 3 * t2 + 1) * this.hs[i] + (t3 - 2 * t2 + t) * h * this.ms[i] + (-2 * t3 + 3 * t2) * this.hs[j] + (t3 - t2) * h * this.ms[j]
    );
  }

  /** dH/dd = M(a, b, |d|), from Maxwell's formula itself. */
  slope(d: number): number {
    return mutualInductanceLoops(this.a, this.b, Math.abs(d));
  }
}

const PANEL_RULE = gaussLegendre(8);

/**
 * Secondary elevation (bottom of the winding above the primary plane) at which k with all primary turns
 * equals `targetK`. Searches upward from the elevation of strongest coupling, since raising the
 * secondary is how builders loosen coupling (Stefan's tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM; common practice); elevations where the primary would cut
 * through the winding are skipped. Null without a primary or when the target is out of reach.
 *
 * Method: the 49-point scan for the strongest coupling and the bracketing of the first crossing above it
 * (Illinois, {@link findRoot}) run on the tabulated ring–sheet model ({@link RingSheetTable}); the root is
 * then polished by Newton's method on the full quadrature model, whose derivative in the elevation is exact
 * and cheap: dM/dz₀ = (N/ℓ) Σᵢ wᵢ [M(aᵢ, b, z₀ + ℓ − zᵢ) − M(aᵢ, b, z₀ − zᵢ)]. Three to four full
 * evaluations instead of about ninety; the answers agree with the all-quadrature search to 1e-9 m or
 * better on the recorded cases (tests/solver/fixtures/elevation-for-coupling.json).
 */
export function elevationForCoupling(d: DesignSI, targetK: number): number | null {
  const p = d.primary;
  if (!p) return null;
  const len = windingLength(d.secondary);
  const L1 = evaluatePrimary(p).inductance;
  const L2 = evaluateSecondary(d.secondary).inductance;
  const lo = Math.max(-d.groundClearance, -len - 0.25);
  const hi = Math.max(1, 2 * len) + Math.max(0, p.elevation);
  // checkDesign (topload left out) depends on the elevation only through the ground plane and the primary
  // turns that would run through the winding; everything else is checked once, far above the primary.
  const fixedOk = checkDesign({ ...withSecondary(d, { elevation: hi + 1e3 }), topload: null }).length === 0;
  const allRings = primaryRings(primaryParams(p));
  const pa = p.conductorDiameter / 2;
  const wireR = d.secondary.wire.insulatedDiameter / 2;
  const rw = windingDiameter(d.secondary) / 2;
  const inWay = allRings.filter((ring) => ring.r - pa < rw + wireR).map((ring) => ring.z);
  const valid = (e: number): boolean => {
    if (!fixedOk || e < -d.groundClearance) return false;
    const zLo = e - pa - wireR;
    const zHi = e + len + pa + wireR;
    for (const z of inWay) if (z > zLo && z < zHi) return false;
    return true;
  };
  const kFull = (e: number): number => evaluateCoupling(p, { ...d.secondary, elevation: e }, L1, L2).k;

  const sheet = secondarySheet(d.secondary);
  const scale = sheet.turns / sheet.length / Math.sqrt(L1 * L2);
  const rings = allRings.filter((r) => (r.weight ?? 1) !== 0);
  const tables = rings.map((r) => {
    const dMax = Math.max(Math.abs(lo - r.z), Math.abs(hi + sheet.length - r.z), Math.abs(lo + sheet.length - r.z), Math.abs(hi - r.z));
    return new RingSheetTable(r.r, sheet.radius, dMax);
  });
  const kCheap = (e: number): number => {
    let m = 0;
    for (let i = 0; i < rings.length; i++) {
      const z = rings[i].z;
      m += (rings[i].weight ?? 1) * (tables[i].at(e + sheet.length - z) - tables[i].at(e - z));
    }
    return m * scale;
  };
  const dkde = (e: number): number => {
    let m = 0;
    for (let i = 0; i < rings.length; i++) {
      const z = rings[i].z;
      m += (rings[i].weight ?? 1) * (tables[i].slope(e + sheet.length - z) - tables[i].slope(e - z));
    }
    return m * scale;
  };
  const kAt = (e: number): number => (valid(e) ? kCheap(e) : NaN);

  const samples = 48;
  let best = -Infinity;
  let bestE = NaN;
  for (let i = 0; i <= samples; i++) {
    const e = lo + ((hi - lo) * i) / samples;
    const k = kAt(e);
    if (Number.isFinite(k) && k > best) {
      best = k;
      bestE = e;
    }
  }
  if (!Number.isFinite(bestE) || targetK > best) return null;
  const rough = findRoot((e) => kAt(e) - targetK, bestE, hi, 32, 1e-10);
  if (rough === null) return null;
  // Newton on the full model from the cheap model's root: the table is good to about 1e-6 m, so one step
  // lands at rounding level (the error after a step is of the order of the step squared).
  let e = rough;
  for (let i = 0; i < 4; i++) {
    const slope = dkde(e);
    if (!Number.isFinite(slope) || slope === 0) break;
    const step = (kFull(e) - targetK) / slope;
    const next = e - step;
    if (!(next >= bestE && next <= hi) || !valid(next)) break;
    e = next;
    if (Math.abs(step) <= 1e-5) return e;
  }
  // Not converged (a kink in the valid range): the full model's own bracket search from the cheap root's neighbourhood.
  return findRoot((x) => (valid(x) ? kFull(x) : NaN) - targetK, bestE, hi, 32);
}

/** Tank capacitance of a design (single capacitor or bank), for the inverse helpers' callers. */
export function tankCapacitance(d: DesignSI): number | null {
  return d.tank ? evaluateTank(d.tank, d.supply).capacitance : null;
}
