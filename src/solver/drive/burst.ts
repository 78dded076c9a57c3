import type { BurstCircuitSI, BurstResult, BurstWaveform, DriveSettingsSI } from './types';

/** Steps per period of the faster normal mode (at least 200; 256 keeps the interpolated peaks near 1e-9). */
export const BURST_STEPS_PER_PERIOD = 256;
/** Longest burst simulated, in periods of the faster mode (2.56 million steps at the default step). */
export const BURST_MAX_PERIODS = 10000;
/** Buckets of the decimated waveform: each contributes its largest |i1| and largest |v_C2| sample (with t = 0 and the end, ≤ 2000 points). */
const WAVEFORM_BUCKETS = 999;

export interface BurstOptions {
  /** steps per period of the faster normal mode; default BURST_STEPS_PER_PERIOD, at least 200 */
  stepsPerPeriod?: number;
}

/**
 * Angular frequency of the faster normal mode of the coupled circuit. Dual-resonant: the larger root of
 * (L1 L2 − M²) ω⁴ − (L1/C2 + L2/C1) ω² + 1/(C1 C2) = 0 (det(K − ω² L) = 0 for the inductance matrix L
 * and elastance matrix K). Single-resonant (no C1): ω² = L1 / (C2 (L1 L2 − M²)).
 */
export function fastModeOmega(circuit: BurstCircuitSI): number {
  const { L1, C1, L2, C2, M } = circuit;
  const det = L1 * L2 - M * M;
  if (C1 === null) return Math.sqrt(L1 / (C2 * det));
  const b = L1 / C2 + L2 / C1;
  const c = 1 / (C1 * C2);
  const disc = Math.sqrt(Math.max(0, b * b - 4 * det * c));
  return Math.sqrt((b + disc) / (2 * det));
}

function checkInputs(settings: DriveSettingsSI, circuit: BurstCircuitSI): void {
  const positive = (name: string, x: number) => {
    if (!(Number.isFinite(x) && x > 0)) throw new RangeError(`burst simulation: ${name} must be a positive finite number (got ${x})`);
  };
  const nonNegative = (name: string, x: number) => {
    if (!(Number.isFinite(x) && x >= 0)) throw new RangeError(`burst simulation: ${name} must be zero or more (got ${x})`);
  };
  positive('L1', circuit.L1);
  positive('L2', circuit.L2);
  positive('C2', circuit.C2);
  if (settings.topology === 'dual-resonant') {
    if (circuit.C1 === null) throw new RangeError('burst simulation: a dual-resonant drive needs the tank capacitance C1');
    positive('C1', circuit.C1);
  }
  nonNegative('R1', circuit.R1);
  nonNegative('R2', circuit.R2);
  if (!Number.isFinite(circuit.M) || circuit.M * circuit.M >= circuit.L1 * circuit.L2) {
    throw new RangeError(`burst simulation: |M| must be below √(L1 L2) (coupling coefficient under 1; got M = ${circuit.M})`);
  }
  nonNegative('busVoltage', settings.busVoltage);
  positive('onTime', settings.onTime);
  nonNegative('repetitionRate', settings.repetitionRate);
}

/**
 * Time-domain simulation of one bridge-driven burst, from rest at t = 0 to `onTime`.
 *
 * Circuit: the primary (L1, R1, and the tank C1 for a dual-resonant coil) driven by the bridge, coupled
 * through M to the secondary (L2, C2, R2: its lumped equivalent at the top). With q the capacitor charges
 * and i the loop currents,
 *   L1 i1' + M i2' = v_b − R1 i1 − q1/C1,    M i1' + L2 i2' = −R2 i2 − q2/C2,    q1' = i1, q2' = i2,
 * and v_b = ±V, V = busVoltage (full bridge) or busVoltage/2 (half bridge).
 * - dual-resonant: +V while i1 ≥ 0, −V while i1 < 0 (zero-current switching), +V from rest at t = 0;
 * - single-resonant (no C1; the bridge drives the primary turns directly): the bridge follows the secondary
 *   base current i2 fed back from the base, phased so the drive is regenerative: +V while −sgn(M)·i2 ≥ 0
 *   (at t = 0 the bridge's +V starts i2 in the direction −sgn(M), so the feedback keeps that polarity;
 *   the opposite phasing would oppose the secondary current, and a builder reverses the feedback winding).
 *
 * Method: between switchings the circuit is linear with a constant source, x' = A x (the source folded in
 * as a constant fifth state), so the fixed step of one `stepsPerPeriod`-th of the faster normal mode's
 * period (shorter when the resistive rate calls for it) is the Taylor series of exp(hA) to order 14,
 * built once: a fixed-step Taylor method whose truncation error (about (2π/256)¹⁵/15!) is far below
 * rounding, so the 1e-4 accuracy asked of the peaks is met with a wide margin. A step in which the
 * switched current changes sign is cut at the crossing: the cubic Hermite interpolant on the step places
 * it, Newton's method on the same Taylor series from the start of the step refines it to rounding, and the
 * step then continues with the other polarity. Peaks of |i1|, |i2|, |v_C1|, |v_C2| are taken from the
 * cubic Hermite interpolant between steps (values and derivatives at both ends; error about 1e-9 of the
 * peak). The energy drawn from the bus is v_b × the charge through the bridge in each segment (exact);
 * the energy dissipated R1∫i1² + R2∫i2² and ∫i1² come from the same interpolant integrated exactly (the
 * Hermite element's Gram matrix), so the energy balance drawn = stored + dissipated checks the integration.
 *
 * The over-current trip is reported, not modelled: when |i1| reaches `currentLimit` (or, without one,
 * `switchPeakCurrent`) the time is returned as `timeToCurrentLimit` and the burst carries on to `onTime`,
 * so `peakPrimaryCurrent` is the peak the on-time asks of the switches. The burst ends at `onTime`
 * exactly; the ring-down after the bridge stops is not simulated. The secondary is unloaded (no streamer
 * loss beyond R2), so its peak voltage is an upper bound.
 *
 * Checked against: the closed-form envelope 2Vt/(πL) of an undamped series RLC driven at resonance by a
 * square wave (Nilsson & Riedel, Electric Circuits, Fourier series of a square wave and series resonance),
 * and an independent event-located integration with scipy solve_ivp (scripts/fixtures/burst_reference.py).
 * Domain: L1, L2, C2 (and C1 for dual-resonant) > 0; R1, R2 ≥ 0; |M| < √(L1 L2); burst ≤ BURST_MAX_PERIODS.
 * Example: L1 = 10 µH, C1 = 253.3 nF (100 kHz), lossless, uncoupled, full bridge on 100 V, 200 µs:
 * peakPrimaryCurrent = 2·100 V·197.5 µs/(π·10 µH) = 1257.3 A (the last crest before the end of the on-time).
 */
export function simulateBurst(settings: DriveSettingsSI, circuit: BurstCircuitSI, options: BurstOptions = {}): BurstResult {
  checkInputs(settings, circuit);
  const dual = settings.topology === 'dual-resonant';
  const { L1, L2, C2, R1, R2, M } = circuit;
  const C1 = dual ? (circuit.C1 as number) : null;
  const invC1 = C1 === null ? 0 : 1 / C1;
  const invC2 = 1 / C2;
  const det = L1 * L2 - M * M;
  const V = settings.bridge === 'full' ? settings.busVoltage : settings.busVoltage / 2;
  const tEnd = settings.onTime;
  const limit = settings.currentLimit ?? settings.switchPeakCurrent;
  // Sign applied to the switched current: i1 itself (dual) or the base current phased as described above.
  const feedbackSign = M > 0 ? -1 : 1;

  const stepsPerPeriod = Math.max(200, Math.round(options.stepsPerPeriod ?? BURST_STEPS_PER_PERIOD));
  const w = fastModeOmega({ ...circuit, C1 });
  const period = (2 * Math.PI) / w;
  if (tEnd / period > BURST_MAX_PERIODS) {
    throw new RangeError(`burst simulation: the on-time spans ${Math.round(tEnd / period)} periods of the circuit, more than ${BURST_MAX_PERIODS}`);
  }
  const resistiveRate = (R1 * L2 + R2 * L1) / det;
  const h = Math.min(period / stepsPerPeriod, 0.1 / Math.max(resistiveRate, 1e-300));
  if (tEnd / h > BURST_MAX_STEPS) {
    throw new RangeError(`burst simulation: the circuit's resistance asks for ${Math.round(tEnd / h)} steps, more than ${BURST_MAX_STEPS}`);
  }

  // Scaled state z = [ω q1, ω q2, i1, i2, u], all in amperes, with u = v_b L2 /(det ω) the source held constant.
  const A = new Float64Array(25);
  A[0 * 5 + 2] = w;
  A[1 * 5 + 3] = w;
  A[2 * 5 + 0] = (-L2 * invC1) / (w * det);
  A[2 * 5 + 1] = (M * invC2) / (w * det);
  A[2 * 5 + 2] = (-L2 * R1) / det;
  A[2 * 5 + 3] = (M * R2) / det;
  A[2 * 5 + 4] = w;
  A[3 * 5 + 0] = (M * invC1) / (w * det);
  A[3 * 5 + 1] = (-L1 * invC2) / (w * det);
  A[3 * 5 + 2] = (M * R1) / det;
  A[3 * 5 + 3] = (-L1 * R2) / det;
  A[3 * 5 + 4] = (-M * w) / L2;
  const uOfVoltage = L2 / (det * w);
  const Phi = taylorPropagator(A, h);
  // the fixed step's propagator and the current rows of A as locals for the inner loop
  const [p00, p01, p02, p03, p04, p10, p11, p12, p13, p14, p20, p21, p22, p23, p24, p30, p31, p32, p33, p34] = Phi;
  const [a20, a21, a22, a23, a24, a30, a31, a32, a33, a34] = A.subarray(10, 20);

  let peakI1 = 0, peakI2 = 0, peakVC1 = 0, peakVC2 = 0;
  let tripTime: number | null = null;
  const switchingInstants: number[] = [];

  // Waveform: the first sample, then per time bucket the step with the largest |i1| and the one with the largest |v_C2|.
  const wave: BurstWaveform = { time: [0], primaryCurrent: [0], secondaryVoltage: [0] };
  let bucket = 0;
  // The bucket's candidates [t, i1, v2] of the largest |i1| and of the largest |v_C2| (t = −1: none yet),
  // kept in a typed array so that the per-step writes allocate nothing.
  const cand = new Float64Array([-1, 0, 0, -1, 0, 0]);
  const push = (t: number, i1: number, v2: number) => {
    wave.time.push(t);
    wave.primaryCurrent.push(i1);
    wave.secondaryVoltage.push(v2);
  };
  const flush = () => {
    const iFirst = cand[0] <= cand[3] || cand[3] < 0;
    const a = iFirst ? 0 : 3;
    const b = iFirst ? 3 : 0;
    if (cand[a] >= 0) push(cand[a], cand[a + 1], cand[a + 2]);
    if (cand[b] >= 0 && cand[b] !== cand[a]) push(cand[b], cand[b + 1], cand[b + 2]);
    cand[0] = -1;
    cand[3] = -1;
  };
  const sample = (t: number, i1: number, v2: number) => {
    const b = Math.min(WAVEFORM_BUCKETS - 1, Math.floor((t / tEnd) * WAVEFORM_BUCKETS));
    if (b !== bucket) {
      flush();
      bucket = b;
    }
    if (cand[0] < 0 || Math.abs(i1) > Math.abs(cand[1])) {
      cand[0] = t;
      cand[1] = i1;
      cand[2] = v2;
    }
    if (cand[3] < 0 || Math.abs(v2) > Math.abs(cand[5])) {
      cand[3] = t;
      cand[4] = i1;
      cand[5] = v2;
    }
  };

  const z = new Float64Array(5);
  const zn = new Float64Array(5);
  const powers = new Float64Array(5 * (TAYLOR_ORDER + 1));
  let polarity = 1;
  z[4] = V * uOfVoltage;
  let t = 0;
  let drawn = 0;
  let i1Squared = 0;
  let i2Squared = 0;
  let segmentCharge = 0; // q1 at the start of the present bridge polarity
  // derivatives of i1 and i2 at the start of the step
  let ra1 = A[14] * z[4];
  let ra2 = A[19] * z[4];

  const maxSteps = Math.ceil(tEnd / h) * 2 + 16;
  for (let n = 0; n < maxSteps && t < tEnd; n++) {
    let hs = Math.min(h, tEnd - t);
    const last = tEnd - t - hs < 1e-9 * h;
    if (last) hs = tEnd - t;
    if (hs === h) {
      const z0 = z[0], z1 = z[1], z2 = z[2], z3 = z[3], z4 = z[4];
      zn[0] = p00 * z0 + p01 * z1 + p02 * z2 + p03 * z3 + p04 * z4;
      zn[1] = p10 * z0 + p11 * z1 + p12 * z2 + p13 * z3 + p14 * z4;
      zn[2] = p20 * z0 + p21 * z1 + p22 * z2 + p23 * z3 + p24 * z4;
      zn[3] = p30 * z0 + p31 * z1 + p32 * z2 + p33 * z3 + p34 * z4;
      zn[4] = z4;
    } else stateAt(A, z, hs, powers, zn);
    let rb1 = a20 * zn[0] + a21 * zn[1] + a22 * zn[2] + a23 * zn[3] + a24 * zn[4];
    let rb2 = a30 * zn[0] + a31 * zn[1] + a32 * zn[2] + a33 * zn[3] + a34 * zn[4];
    let switched = false;
    const sb = dual ? zn[2] : feedbackSign * zn[3];
    if (polarity * sb < 0) {
      // The switched current reversed inside the step: locate the crossing on the step's Taylor series.
      const sa = dual ? z[2] : feedbackSign * z[3];
      const ma = dual ? ra1 : feedbackSign * ra2;
      const mb = dual ? rb1 : feedbackSign * rb2;
      const guess = hs * hermiteRoot(sa, ma * hs, sb, mb * hs);
      hs = crossingTime(A, z, dual ? 2 : 3, guess, hs, powers);
      seriesAt(powers, hs, zn);
      rb1 = rowDot(A, 2, zn);
      rb2 = rowDot(A, 3, zn);
      switched = true;
    }
    // Peaks, trip and quadratures over the smooth step from z to zn.
    const pI1 = stepPeak(z[2], ra1, zn[2], rb1, hs);
    if (limit !== null && tripTime === null && pI1 >= limit) tripTime = t + hs * crossingOfLevel(z[2], ra1 * hs, zn[2], rb1 * hs, limit);
    if (pI1 > peakI1) peakI1 = pI1;
    const pI2 = stepPeak(z[3], ra2, zn[3], rb2, hs);
    if (pI2 > peakI2) peakI2 = pI2;
    const c2 = invC2 / w;
    const pV2 = stepPeak(z[1] * c2, z[3] * invC2, zn[1] * c2, zn[3] * invC2, hs);
    if (pV2 > peakVC2) peakVC2 = pV2;
    if (dual) {
      const c1 = invC1 / w;
      const pV1 = stepPeak(z[0] * c1, z[2] * invC1, zn[0] * c1, zn[2] * invC1, hs);
      if (pV1 > peakVC1) peakVC1 = pV1;
    }
    i1Squared += hermiteSquareIntegral(z[2], ra1 * hs, zn[2], rb1 * hs) * hs;
    i2Squared += hermiteSquareIntegral(z[3], ra2 * hs, zn[3], rb2 * hs) * hs;

    t = last && !switched ? tEnd : t + hs;
    z.set(zn);
    if (switched) {
      switchingInstants.push(t);
      drawn += polarity * V * (z[0] / w - segmentCharge);
      segmentCharge = z[0] / w;
      polarity = -polarity;
      z[4] = polarity * V * uOfVoltage;
      rb1 = rowDot(A, 2, z);
      rb2 = rowDot(A, 3, z);
    }
    ra1 = rb1;
    ra2 = rb2;
    sample(t, z[2], (z[1] / w) * invC2);
  }
  flush();
  if (wave.time[wave.time.length - 1] < tEnd) push(tEnd, z[2], (z[1] / w) * invC2);
  drawn += polarity * V * (z[0] / w - segmentCharge);

  const q1 = z[0] / w, q2 = z[1] / w, i1 = z[2], i2 = z[3];
  const stored = 0.5 * L1 * i1 * i1 + 0.5 * L2 * i2 * i2 + M * i1 * i2 + 0.5 * q1 * q1 * invC1 + 0.5 * q2 * q2 * invC2;
  const dissipated = R1 * i1Squared + R2 * i2Squared;
  const scale = Math.max(Math.abs(drawn), stored + dissipated);
  const relativeError = scale > 0 ? Math.abs(drawn - stored - dissipated) / scale : 0;
  const rate = settings.repetitionRate;

  return {
    primaryFrequency: dual ? 1 / (2 * Math.PI * Math.sqrt(L1 * (C1 as number))) : 1 / (2 * Math.PI * Math.sqrt(L2 * C2)),
    surgeImpedance: dual ? Math.sqrt(L1 / (C1 as number)) : null,
    peakPrimaryCurrent: peakI1,
    timeToCurrentLimit: tripTime,
    capacitorPeakVoltage: dual ? peakVC1 : null,
    // RMS over a repetition period = burst RMS √(∫i1²/T_on) × √(T_on · rate).
    capacitorRmsCurrent: dual ? Math.sqrt(i1Squared * rate) : null,
    secondaryPeakVoltage: peakVC2,
    baseCurrentPeak: peakI2,
    burstEnergy: drawn,
    averagePower: drawn * rate,
    dutyCycle: tEnd * rate,
    // First order: the burst takes charge E/V_bus from C_bus (ΔV = E/(C V)); the rectifier's recharge during
    // the burst and the split capacitors of a half bridge are left out.
    busDroop: settings.busCapacitance && settings.busVoltage > 0 ? drawn / (settings.busCapacitance * settings.busVoltage) : null,
    switchingInstants,
    energyBalance: { drawn, stored, dissipated, relativeError },
    waveform: wave,
    stepsPerPeriod: Math.round(period / h),
  };
}

/** Order of the Taylor series of exp(hA); (2π/200)¹⁵/15! ≈ 3e-35, far below rounding. */
const TAYLOR_ORDER = 14;
/** Most steps one burst may take (a few hundred milliseconds of computing). */
export const BURST_MAX_STEPS = 3_000_000;

function rowDot(A: Float64Array, row: number, z: Float64Array): number {
  const o = row * 5;
  return A[o] * z[0] + A[o + 1] * z[1] + A[o + 2] * z[2] + A[o + 3] * z[3] + A[o + 4] * z[4];
}

/** Σ_{k ≤ TAYLOR_ORDER} (hA)^k / k!, the fixed step's propagator. */
function taylorPropagator(A: Float64Array, h: number): Float64Array {
  const P = new Float64Array(25);
  let term = new Float64Array(25);
  let next = new Float64Array(25);
  for (let i = 0; i < 5; i++) term[i * 6] = 1;
  P.set(term);
  for (let k = 1; k <= TAYLOR_ORDER; k++) {
    for (let r = 0; r < 5; r++) {
      for (let c = 0; c < 5; c++) {
        let s = 0;
        for (let m = 0; m < 5; m++) s += term[r * 5 + m] * A[m * 5 + c];
        next[r * 5 + c] = (s * h) / k;
      }
    }
    [term, next] = [next, term];
    for (let i = 0; i < 25; i++) P[i] += term[i];
  }
  return P;
}

/** Fills powers with A^k z (k = 0…TAYLOR_ORDER), 5 entries each. */
function fillPowers(A: Float64Array, z: Float64Array, powers: Float64Array): void {
  powers.set(z, 0);
  for (let k = 1; k <= TAYLOR_ORDER; k++) {
    const prev = (k - 1) * 5;
    const o = k * 5;
    for (let r = 0; r < 5; r++) {
      let s = 0;
      for (let m = 0; m < 5; m++) s += A[r * 5 + m] * powers[prev + m];
      powers[o + r] = s;
    }
  }
}

/** out = Σ τ^k/k! A^k z from the filled powers. */
function seriesAt(powers: Float64Array, tau: number, out: Float64Array): void {
  out.fill(0);
  let c = 1;
  for (let k = 0; k <= TAYLOR_ORDER; k++) {
    const o = k * 5;
    for (let r = 0; r < 5; r++) out[r] += c * powers[o + r];
    c *= tau / (k + 1);
  }
}

function stateAt(A: Float64Array, z: Float64Array, tau: number, powers: Float64Array, out: Float64Array): void {
  fillPowers(A, z, powers);
  seriesAt(powers, tau, out);
}

/**
 * Time τ in [0, h] at which component `index` of the state, started from z, crosses zero: Newton's method
 * on its Taylor series Σ τ^k/k! (A^k z)[index] from the guess, kept inside the step. Leaves the powers filled.
 */
function crossingTime(A: Float64Array, z: Float64Array, index: number, guess: number, h: number, powers: Float64Array): number {
  fillPowers(A, z, powers);
  let tau = guess;
  for (let it = 0; it < 8; it++) {
    let value = 0;
    let slope = 0;
    let c = 1;
    for (let k = 0; k <= TAYLOR_ORDER; k++) {
      value += c * powers[k * 5 + index];
      if (k < TAYLOR_ORDER) slope += c * powers[(k + 1) * 5 + index];
      c *= tau / (k + 1);
    }
    if (slope === 0) break;
    const next = Math.min(h, Math.max(0, tau - value / slope));
    const moved = Math.abs(next - tau);
    tau = next;
    if (moved <= 1e-15 * h) break;
  }
  return tau;
}

/** Largest |x| on a smooth step of length h from the cubic Hermite interpolant through (xa, ra) and (xb, rb), r = dx/dt. */
function stepPeak(xa: number, ra: number, xb: number, rb: number, h: number): number {
  const best = Math.max(Math.abs(xa), Math.abs(xb));
  if (ra * rb >= 0) return best;
  const th = hermiteExtremum(xa, ra * h, xb, rb * h);
  return th === null ? best : Math.max(best, Math.abs(hermite(xa, ra * h, xb, rb * h, th)));
}

/**
 * ∫₀¹ p(θ)² dθ for the cubic Hermite p through (0, a), (1, b) with end slopes ma, mb: the quadratic form
 * of the Hermite element's Gram ("consistent mass") matrix [156 22 54 −13; 22 4 13 −3; 54 13 156 −22; −13 −3 −22 4]/420.
 */
function hermiteSquareIntegral(a: number, ma: number, b: number, mb: number): number {
  return (
    (156 * (a * a + b * b) + 4 * (ma * ma + mb * mb) + 2 * (22 * a * ma + 54 * a * b - 13 * a * mb + 13 * ma * b - 3 * ma * mb - 22 * b * mb)) / 420
  );
}

/** Cubic Hermite on θ ∈ [0, 1] through (0, a) and (1, b) with end slopes (per unit θ) ma, mb. */
function hermite(a: number, ma: number, b: number, mb: number, th: number): number {
  const t2 = th * th;
  const t3 = t2 * th;
  return (2 * t3 - 3 * t2 + 1) * a + (t3 - 2 * t2 + th) * ma + (-2 * t3 + 3 * t2) * b + (t3 - t2) * mb;
}

/** θ in (0, 1) where the Hermite cubic's slope vanishes (the root between slopes of opposite sign), or null. */
function hermiteExtremum(a: number, ma: number, b: number, mb: number): number | null {
  // p'(θ) = A θ² + B θ + C
  const A = 6 * a + 3 * ma - 6 * b + 3 * mb;
  const B = -6 * a - 4 * ma + 6 * b - 2 * mb;
  const C = ma;
  if (Math.abs(A) < 1e-12 * (Math.abs(B) + Math.abs(C))) {
    const th = B !== 0 ? -C / B : -1;
    return th > 0 && th < 1 ? th : null;
  }
  const disc = B * B - 4 * A * C;
  if (disc < 0) return null;
  // the numerically stable pair of roots
  const q = -0.5 * (B + (B >= 0 ? 1 : -1) * Math.sqrt(disc));
  const r1 = q / A;
  const r2 = q !== 0 ? C / q : r1;
  const inside = (th: number) => th > 0 && th < 1;
  if (inside(r1) && inside(r2)) return Math.min(r1, r2);
  if (inside(r1)) return r1;
  if (inside(r2)) return r2;
  return null;
}

/** θ in [0, 1] where the Hermite cubic first takes the sign of b (a and b of opposite sign), by bisection. */
function hermiteRoot(a: number, ma: number, b: number, mb: number): number {
  let lo = 0, hi = 1;
  const sb = Math.sign(b);
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(hermite(a, ma, b, mb, mid)) === sb) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/** First θ in [0, 1] at which |Hermite cubic| reaches `level`, given that it does within the step. */
function crossingOfLevel(a: number, ma: number, b: number, mb: number, level: number): number {
  if (Math.abs(a) >= level) return 0;
  // Reached at the step's extremum or its end: bisect on [0, θ*] where θ* is the first point at or above the level.
  const ext = ma * mb < 0 ? hermiteExtremum(a, ma, b, mb) : null;
  const hiTh = ext !== null && Math.abs(hermite(a, ma, b, mb, ext)) >= level ? ext : 1;
  let lo = 0, hi = hiTh;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.abs(hermite(a, ma, b, mb, mid)) >= level) hi = mid;
    else lo = mid;
  }
  return hi;
}
