import { simulateBurst } from './burst';
import type { BurstCircuitSI, DriveSettingsSI } from './types';

/** Longest on-time searched by `onTimeForPeakCurrent` when none is given, s (interrupters seldom exceed it; common practice). */
export const ON_TIME_SEARCH_LIMIT = 1e-3;

export interface OnTimeGoal {
  /** s, the shortest on-time whose peak primary current reaches the target; null when none within the search */
  onTime: number | null;
  /** why there is no answer; null when there is one */
  reason: string | null;
  /** A, the largest peak primary current reached within the search */
  largestPeak: number;
}

export interface TankGoal {
  /** F, tank capacitance */
  capacitance: number | null;
  /** H, primary inductance at the tap that tunes it to the target frequency */
  inductance: number | null;
  /** Ω, √(L/C) */
  surgeImpedance: number | null;
  reason: string | null;
}

const amps = (x: number) => `${x.toPrecision(3)} A`;
const micro = (x: number) => `${(x * 1e6).toPrecision(3)} µs`;

/**
 * Shortest on-time at which the peak primary current reaches `targetPeak`. The peak up to time t is a
 * running maximum, so it never falls as the on-time grows: the answer is the first time |i1| reaches the
 * target in one burst simulated to `searchLimit`, located inside the step (see `simulateBurst`'s trip
 * time), with no bisection needed. Returns null with a reason when the target is not positive or the
 * current does not reach it within the search (resistance and the secondary's load cap the envelope).
 * Example: the lossless uncoupled 10 µH / 100 kHz tank on a 100 V full bridge (envelope 2Vt/(πL) = 6.37 A/µs,
 * crests every 5 µs) reaches 500 A at 82.0 µs, on the rise to the crest of 525 A at 82.5 µs.
 */
export function onTimeForPeakCurrent(
  settings: DriveSettingsSI,
  circuit: BurstCircuitSI,
  targetPeak: number,
  searchLimit = Math.max(ON_TIME_SEARCH_LIMIT, settings.onTime),
): OnTimeGoal {
  if (!(Number.isFinite(targetPeak) && targetPeak > 0)) {
    return { onTime: null, reason: 'the target peak current must be a positive number', largestPeak: 0 };
  }
  let r;
  try {
    r = simulateBurst({ ...settings, onTime: searchLimit, currentLimit: targetPeak, switchPeakCurrent: null }, circuit);
  } catch (e) {
    if (e instanceof RangeError) return { onTime: null, reason: `the search to ${micro(searchLimit)} is too long to simulate`, largestPeak: 0 };
    throw e;
  }
  if (r.timeToCurrentLimit === null) {
    return {
      onTime: null,
      reason: `the primary current reaches only ${amps(r.peakPrimaryCurrent)} within ${micro(searchLimit)}, short of ${amps(targetPeak)}`,
      largestPeak: r.peakPrimaryCurrent,
    };
  }
  return { onTime: r.timeToCurrentLimit, reason: null, largestPeak: r.peakPrimaryCurrent };
}

/**
 * Tank capacitance C1, with the primary inductance L1 = 1/((2π f)² C1) that tunes it to `targetFrequency`,
 * for which the peak primary current at the end of `settings.onTime` is `targetPeak`. The coupling
 * coefficient k = M/√(L1 L2) of the given circuit is held as the tap moves (M = k √(L1 L2) at the new L1),
 * and so is R1; both change a little with the tap in a real primary (an approximation).
 * Method: the lossless uncoupled envelope 2V·t/(πL1) = 2V·t·(2πf)²·C1/π gives the first guess; the
 * simulated peak rises with C1 (a lower surge impedance), so the answer is bracketed by widening around
 * the guess and found by Illinois root finding on ln peak − ln target over ln C1 (to 1e-7 of the peak). Null with a reason for a single-resonant coil (no
 * tank), for bad targets, or when no capacitance within a factor of 10⁴ of the guess reaches the target.
 */
export function tankCapacitanceForPeakCurrent(
  settings: DriveSettingsSI,
  circuitWithoutC1: Omit<BurstCircuitSI, 'C1'>,
  targetPeak: number,
  targetFrequency: number,
): TankGoal {
  const none = (reason: string): TankGoal => ({ capacitance: null, inductance: null, surgeImpedance: null, reason });
  if (settings.topology !== 'dual-resonant') return none('a single-resonant coil has no tank capacitor');
  if (!(Number.isFinite(targetPeak) && targetPeak > 0)) return none('the target peak current must be a positive number');
  if (!(Number.isFinite(targetFrequency) && targetFrequency > 0)) return none('the target frequency must be a positive number');
  const V = settings.bridge === 'full' ? settings.busVoltage : settings.busVoltage / 2;
  if (!(V > 0)) return none('the bus voltage must be above zero');
  const { L1, L2, M } = circuitWithoutC1;
  const k = M / Math.sqrt(L1 * L2);
  const w2 = (2 * Math.PI * targetFrequency) ** 2;
  const at = (C1: number) => {
    const L = 1 / (w2 * C1);
    return { L1: L, C1, R1: circuitWithoutC1.R1, L2, C2: circuitWithoutC1.C2, R2: circuitWithoutC1.R2, M: k * Math.sqrt(L * L2) };
  };
  // A tank whose burst is too long to simulate counts as not reaching the target (it is far off the answer).
  const peak = (C1: number) => {
    try {
      return simulateBurst(settings, at(C1)).peakPrimaryCurrent;
    } catch (e) {
      if (e instanceof RangeError) return Number.NaN;
      throw e;
    }
  };

  // The square wave's fundamental 4V/π across R1 bounds the current any tank can reach (the harmonics add
  // well under 1 % at the Q of a working tank).
  const resistiveCap = circuitWithoutC1.R1 > 0 ? (4 * V) / (Math.PI * circuitWithoutC1.R1) : Infinity;
  if (targetPeak > 1.02 * resistiveCap) {
    return none(`no tank reaches ${amps(targetPeak)}: the primary resistance caps the current near 4V/(πR1) = ${amps(resistiveCap)}`);
  }
  const guess = (Math.PI * targetPeak) / (2 * V * settings.onTime * w2);
  let lo = guess;
  let hi = guess;
  let pLo = peak(lo);
  let pHi = pLo;
  if (!Number.isFinite(pLo)) return none('the burst of this tank is too long to simulate');
  // Widen by factors of 3.2 (up to 10⁴ each way); a tank too extreme to simulate ends the widening.
  for (let i = 0; i < 8 && pLo > targetPeak; i++) {
    const p = peak(lo / 3.2);
    if (!Number.isFinite(p)) break;
    hi = lo;
    pHi = pLo;
    lo /= 3.2;
    pLo = p;
  }
  for (let i = 0; i < 8 && pHi < targetPeak; i++) {
    const p = peak(hi * 3.2);
    // stop where the tank is too extreme to simulate or the peak has stopped rising (resistance, load)
    if (!Number.isFinite(p) || p < 1.01 * pHi) break;
    lo = hi;
    pLo = pHi;
    hi *= 3.2;
    pHi = p;
  }
  if (pLo > targetPeak || pHi < targetPeak) {
    return none(
      pHi < targetPeak
        ? `no tank reaches ${amps(targetPeak)} in ${micro(settings.onTime)}: the largest found is ${amps(pHi)} (resistance and the secondary's load cap it)`
        : `even a tank of ${(lo * 1e9).toPrecision(3)} nF exceeds ${amps(targetPeak)} in ${micro(settings.onTime)}`,
    );
  }
  // Illinois (modified regula falsi) on g(x) = ln peak(eˣ) − ln target, x = ln C1: the peak is close to
  // proportional to C1, so g is nearly linear in x and a handful of simulations suffice.
  let x0 = Math.log(lo), g0 = Math.log(pLo / targetPeak);
  let x1 = Math.log(hi), g1 = Math.log(pHi / targetPeak);
  let side = 0;
  for (let i = 0; i < 60 && Math.abs(x1 - x0) > 1e-7; i++) {
    let x = g1 === g0 ? 0.5 * (x0 + x1) : (x0 * g1 - x1 * g0) / (g1 - g0);
    if (!(x > Math.min(x0, x1) && x < Math.max(x0, x1))) x = 0.5 * (x0 + x1);
    const g = Math.log(peak(Math.exp(x)) / targetPeak);
    if (!Number.isFinite(g)) return none('the burst of a tank in the search range is too long to simulate');
    if (Math.abs(g) < 1e-7) {
      x0 = x1 = x;
      break;
    }
    if (Math.sign(g) === Math.sign(g0)) {
      x0 = x;
      g0 = g;
      if (side === -1) g1 /= 2;
      side = -1;
    } else {
      x1 = x;
      g1 = g;
      if (side === 1) g0 /= 2;
      side = 1;
    }
  }
  lo = Math.exp(Math.min(x0, x1));
  hi = Math.exp(Math.max(x0, x1));
  const C1 = Math.sqrt(lo * hi);
  const L = 1 / (w2 * C1);
  return { capacitance: C1, inductance: L, surgeImpedance: Math.sqrt(L / C1), reason: null };
}
