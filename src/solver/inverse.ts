import { resonantFrequencyLC } from './secondary/resonance';
import type { DesignSI } from './types';
import { checkDesign } from './system/checks';
import { evaluateSecondary } from './system/secondary';
import { evaluateTopload } from './system/topload';
import { evaluateCoupling, evaluatePrimary, primaryInductanceAtTap } from './system/primary';
import { findRoot } from './system/roots';
import { capacitanceForResonance } from './tuning/tap';
import { evaluateTank } from './tank/evaluate';
import { closeWoundLength, windingLength } from './system/geometry';
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
 * Secondary elevation (bottom of the winding above the primary plane) at which k with all primary turns
 * equals `targetK`. Searches upward from the elevation of strongest coupling, since raising the
 * secondary is how builders loosen coupling (Stefan's tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM; common practice); elevations where the primary would cut
 * through the winding are skipped. Null without a primary or when the target is out of reach.
 */
export function elevationForCoupling(d: DesignSI, targetK: number): number | null {
  const p = d.primary;
  if (!p) return null;
  const len = windingLength(d.secondary);
  const L1 = evaluatePrimary(p).inductance;
  const L2 = evaluateSecondary(d.secondary).inductance;
  const lo = Math.max(-d.groundClearance, -len - 0.25);
  const hi = Math.max(1, 2 * len) + Math.max(0, p.elevation);
  const kAt = (e: number): number => {
    const trial: DesignSI = { ...withSecondary(d, { elevation: e }), topload: null };
    if (checkDesign(trial).length > 0) return NaN;
    return evaluateCoupling(p, trial.secondary, L1, L2).k;
  };
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
  return findRoot((e) => kAt(e) - targetK, bestE, hi, 32);
}

/** Tank capacitance of a design (single capacitor or bank), for the inverse helpers' callers. */
export function tankCapacitance(d: DesignSI): number | null {
  return d.tank ? evaluateTank(d.tank, d.supply).capacitance : null;
}
