import type { BurstCircuitSI, BurstResult, BurstWaveform, DriveSettingsSI } from './types';

/** RK4 steps per period of the faster normal mode (the brief's floor is 200; 256 keeps peaks well inside 1e-4). */
export const BURST_STEPS_PER_PERIOD = 256;
/** Longest burst simulated, in periods of the faster mode (about 2.6 million steps, a fraction of a second). */
export const BURST_MAX_PERIODS = 10000;
/** Buckets of the decimated waveform: each contributes its largest |i1| and largest |v_C2| sample. */
const WAVEFORM_BUCKETS = 999;

export interface BurstOptions {
  /** RK4 steps per period of the faster normal mode; default BURST_STEPS_PER_PERIOD, at least 200 */
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
 * Method: classical fourth-order Runge–Kutta at a fixed step of one `stepsPerPeriod`-th of the faster
 * normal mode's period (or of the resistive time constant when that is shorter). A step in which the
 * switched current changes sign is cut at the crossing: the crossing is first placed by the cubic Hermite
 * interpolant of that current on the step (values and derivatives at both ends), then refined by Newton
 * steps that re-integrate from the start of the step, so each switching instant is located to about
 * 1e-12 of a period; the step then continues with the other polarity. Peaks of |i1|, |i2|, |v_C1|, |v_C2|
 * are taken from the Hermite interpolant between steps (error far below 1e-4 of the peak). The energy
 * drawn from the bus (∫ v_b i1 dt), the energy dissipated (∫ R1 i1² + R2 i2² dt) and ∫ i1² dt are
 * integrated as further state variables, so the energy balance checks the integration itself.
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
 * peakPrimaryCurrent ≈ 2·100·195 µs/(π·10 µH) ≈ 1242 A (the last crest before the end of the on-time).
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
  const wFast = Math.max(fastModeOmega({ ...circuit, C1 }), (R1 * L2 + R2 * L1) / det);
  const period = (2 * Math.PI) / wFast;
  if (tEnd / period > BURST_MAX_PERIODS) {
    throw new RangeError(`burst simulation: the on-time spans ${Math.round(tEnd / period)} periods of the circuit, more than ${BURST_MAX_PERIODS}`);
  }
  const hNominal = period / stepsPerPeriod;

  // State: q1, q2, i1, i2, energy drawn, energy dissipated, ∫ i1² dt.
  const N = 7;
  let y = new Float64Array(N);
  let yNext = new Float64Array(N);
  const tmp = new Float64Array(N);
  const k2 = new Float64Array(N);
  const k3 = new Float64Array(N);
  const k4 = new Float64Array(N);
  let dEnd = new Float64Array(N);
  let dStart = new Float64Array(N);

  const deriv = (s: Float64Array, vb: number, out: Float64Array) => {
    const q1 = s[0], q2 = s[1], i1 = s[2], i2 = s[3];
    const v1 = vb - R1 * i1 - q1 * invC1;
    const v2 = -R2 * i2 - q2 * invC2;
    out[0] = i1;
    out[1] = i2;
    out[2] = (L2 * v1 - M * v2) / det;
    out[3] = (L1 * v2 - M * v1) / det;
    out[4] = vb * i1;
    out[5] = R1 * i1 * i1 + R2 * i2 * i2;
    out[6] = i1 * i1;
  };
  /** One RK4 step of length h from s (whose derivative d0 is given) into out. */
  const rk4 = (s: Float64Array, d0: Float64Array, h: number, vb: number, out: Float64Array) => {
    const h2 = h / 2;
    for (let j = 0; j < N; j++) tmp[j] = s[j] + h2 * d0[j];
    deriv(tmp, vb, k2);
    for (let j = 0; j < N; j++) tmp[j] = s[j] + h2 * k2[j];
    deriv(tmp, vb, k3);
    for (let j = 0; j < N; j++) tmp[j] = s[j] + h * k3[j];
    deriv(tmp, vb, k4);
    const h6 = h / 6;
    for (let j = 0; j < N; j++) out[j] = s[j] + h6 * (d0[j] + 2 * k2[j] + 2 * k3[j] + k4[j]);
  };
  // The switched current and its time derivative.
  const sw = (s: Float64Array) => (dual ? s[2] : feedbackSign * s[3]);
  const swRate = (d: Float64Array) => (dual ? d[2] : feedbackSign * d[3]);

  let peakI1 = 0, peakI2 = 0, peakVC1 = 0, peakVC2 = 0;
  let tripTime: number | null = null;
  const switchingInstants: number[] = [];

  // Waveform: the first sample, then per time bucket the step with the largest |i1| and the one with the largest |v_C2|.
  const wave: BurstWaveform = { time: [0], primaryCurrent: [0], secondaryVoltage: [0] };
  let bucket = 0;
  // best |i1| and best |v_C2| sample of the current bucket (time −1: none yet)
  let iT = -1, iI = 0, iV = 0;
  let vT = -1, vI = 0, vV = 0;
  const push = (t: number, i1: number, v2: number) => {
    wave.time.push(t);
    wave.primaryCurrent.push(i1);
    wave.secondaryVoltage.push(v2);
  };
  const flush = () => {
    if (iT >= 0 && vT >= 0 && iT !== vT) {
      if (iT < vT) {
        push(iT, iI, iV);
        push(vT, vI, vV);
      } else {
        push(vT, vI, vV);
        push(iT, iI, iV);
      }
    } else if (iT >= 0) push(iT, iI, iV);
    iT = -1;
    vT = -1;
  };
  const sample = (t: number, s: Float64Array) => {
    const b = Math.min(WAVEFORM_BUCKETS - 1, Math.floor((t / tEnd) * WAVEFORM_BUCKETS));
    if (b !== bucket) {
      flush();
      bucket = b;
    }
    const i1 = s[2];
    const v2 = s[1] * invC2;
    if (iT < 0 || Math.abs(i1) > Math.abs(iI)) {
      iT = t;
      iI = i1;
      iV = v2;
    }
    if (vT < 0 || Math.abs(v2) > Math.abs(vV)) {
      vT = t;
      vI = i1;
      vV = v2;
    }
  };

  /**
   * Largest |x| on a smooth step from the cubic Hermite interpolant through (xa, ra) and (xb, rb), r = dx/dt,
   * step length h. Looks inside the step only when the derivative changes sign (an extremum there).
   */
  const stepPeak = (xa: number, ra: number, xb: number, rb: number, h: number): number => {
    let best = Math.max(Math.abs(xa), Math.abs(xb));
    if (ra * rb < 0) {
      const th = hermiteExtremum(xa, ra * h, xb, rb * h);
      if (th !== null) best = Math.max(best, Math.abs(hermite(xa, ra * h, xb, rb * h, th)));
    }
    return best;
  };

  /** Tracks peaks and the trip over the smooth step [t, t + h] from ya (derivative da) to yb (derivative db). */
  const track = (t: number, h: number, ya: Float64Array, da: Float64Array, yb: Float64Array, db: Float64Array) => {
    const pI1 = stepPeak(ya[2], da[2], yb[2], db[2], h);
    if (limit !== null && tripTime === null && pI1 >= limit) tripTime = t + h * crossingOfLevel(ya[2], da[2] * h, yb[2], db[2] * h, limit);
    peakI1 = Math.max(peakI1, pI1);
    peakI2 = Math.max(peakI2, stepPeak(ya[3], da[3], yb[3], db[3], h));
    peakVC2 = Math.max(peakVC2, stepPeak(ya[1] * invC2, da[1] * invC2, yb[1] * invC2, db[1] * invC2, h));
    if (dual) peakVC1 = Math.max(peakVC1, stepPeak(ya[0] * invC1, da[0] * invC1, yb[0] * invC1, db[0] * invC1, h));
  };

  let t = 0;
  let polarity = 1;
  deriv(y, V, dStart);
  const maxSteps = Math.ceil(tEnd / hNominal) * 3 + 16;
  for (let n = 0; n < maxSteps && t < tEnd; n++) {
    const vb = polarity * V;
    let h = Math.min(hNominal, tEnd - t);
    if (tEnd - t - h < 1e-9 * hNominal) h = tEnd - t;
    rk4(y, dStart, h, vb, yNext);
    deriv(yNext, vb, dEnd);
    let switched = false;
    const sb = sw(yNext);
    if (polarity * sb < 0) {
      // The switched current reversed inside the step: place the crossing, re-integrate up to it.
      const sa = sw(y);
      let tau = h * hermiteRoot(sa, swRate(dStart) * h, sb, swRate(dEnd) * h);
      for (let it = 0; it < 4; it++) {
        rk4(y, dStart, tau, vb, yNext);
        deriv(yNext, vb, dEnd);
        const s = sw(yNext);
        const r = swRate(dEnd);
        if (r === 0) break;
        const next = Math.min(h, Math.max(0, tau - s / r));
        const moved = Math.abs(next - tau);
        tau = next;
        if (moved <= 1e-13 * h) break;
      }
      rk4(y, dStart, tau, vb, yNext);
      deriv(yNext, vb, dEnd);
      h = tau;
      switched = true;
    }
    track(t, h, y, dStart, yNext, dEnd);
    t = h === tEnd - t ? tEnd : t + h;
    [y, yNext] = [yNext, y];
    if (switched) {
      switchingInstants.push(t);
      polarity = -polarity;
      deriv(y, polarity * V, dStart);
    } else {
      [dStart, dEnd] = [dEnd, dStart];
    }
    sample(t, y);
  }
  flush();

  const [q1, q2, i1, i2, drawn, dissipated, i1Squared] = y;
  const stored = 0.5 * L1 * i1 * i1 + 0.5 * L2 * i2 * i2 + M * i1 * i2 + 0.5 * q1 * q1 * invC1 + 0.5 * q2 * q2 * invC2;
  const scale = Math.max(Math.abs(drawn), stored + dissipated);
  const relativeError = scale > 0 ? Math.abs(drawn - stored - dissipated) / scale : 0;
  const rate = settings.repetitionRate;
  const dutyCycle = tEnd * rate;

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
    dutyCycle,
    // First order: the burst takes charge E/V_bus from C_bus (ΔV = E/(C V)); the rectifier's recharge during
    // the burst and the split capacitors of a half bridge are left out.
    busDroop: settings.busCapacitance && settings.busVoltage > 0 ? drawn / (settings.busCapacitance * settings.busVoltage) : null,
    switchingInstants,
    energyBalance: { drawn, stored, dissipated, relativeError },
    waveform: wave,
    stepsPerPeriod,
  };
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
