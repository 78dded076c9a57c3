/**
 * Interim burst integration with the interface of the drive family (src/solver/drive), used until that
 * family's own simulation is merged. Coupled primary (L1, C1 or none, R1) and secondary (L2, C2, R2) with
 * mutual M:  L1 i1' + M i2' = v − R1 i1 − q1/C1,  M i1' + L2 i2' = −R2 i2 − q2/C2  (Kirchhoff's voltage law),
 * integrated by classical fourth-order Runge–Kutta at a fixed step of 1/200 of the drive period. The bridge
 * applies +V while the feedback current (i1 with a tank, i2 without) is ≥ 0 and −V while it is < 0, sampled
 * at the start of each step, until the on-time or the current limit.
 */
import type { BurstCircuitSI, BurstResult, DriveSettingsSI } from '../drive/types';

const STEPS_PER_PERIOD = 200;
const MAX_SAMPLES = 4000;

export function simulateBurst(s: DriveSettingsSI, c: BurstCircuitSI): BurstResult {
  const V = s.bridge === 'full' ? s.busVoltage : s.busVoltage / 2;
  const tank = c.C1 !== null;
  const f = tank ? 1 / (2 * Math.PI * Math.sqrt(c.L1 * c.C1!)) : 1 / (2 * Math.PI * Math.sqrt(c.L2 * c.C2));
  const dt = 1 / (f * STEPS_PER_PERIOD);
  const limit = s.currentLimit ?? s.switchPeakCurrent ?? Infinity;
  const det = c.L1 * c.L2 - c.M * c.M;
  const inv1 = tank ? 1 / c.C1! : 0;
  const deriv = (x: number[], v: number): number[] => {
    const a = v - c.R1 * x[1] - x[0] * inv1;
    const b = -c.R2 * x[3] - x[2] / c.C2;
    return [x[1], (c.L2 * a - c.M * b) / det, x[3], (c.L1 * b - c.M * a) / det];
  };
  let x = [0, 0, 0, 0];
  let t = 0;
  const n = Math.max(1, Math.ceil(s.onTime / dt));
  const every = Math.max(1, Math.ceil(n / MAX_SAMPLES));
  const time: number[] = [0];
  const primaryCurrent: number[] = [0];
  const secondaryVoltage: number[] = [0];
  const switching: number[] = [0];
  let sign = 1;
  let drawn = 0;
  let dissipated = 0;
  let i1sq = 0;
  let peak = 0;
  let vcap = 0;
  let vsec = 0;
  let ibase = 0;
  let tripAt: number | null = null;
  for (let k = 0; k < n; k++) {
    const h = Math.min(dt, s.onTime - t);
    if (h <= 0) break;
    const fb = tank ? x[1] : x[3];
    const next = fb >= 0 ? 1 : -1;
    if (next !== sign && k > 0) switching.push(t);
    sign = next;
    const v = sign * V;
    const k1 = deriv(x, v);
    const k2 = deriv(x.map((xi, i) => xi + (h / 2) * k1[i]), v);
    const k3 = deriv(x.map((xi, i) => xi + (h / 2) * k2[i]), v);
    const k4 = deriv(x.map((xi, i) => xi + h * k3[i]), v);
    const xn = x.map((xi, i) => xi + (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]));
    // Simpson's rule on the step's ends and middle for the energies and the mean square current
    const i1m = x[1] + (h / 2) * k2[1];
    const i2m = x[3] + (h / 2) * k2[3];
    drawn += (v * h * (x[1] + 4 * i1m + xn[1])) / 6;
    dissipated += (h * (c.R1 * (x[1] ** 2 + 4 * i1m ** 2 + xn[1] ** 2) + c.R2 * (x[3] ** 2 + 4 * i2m ** 2 + xn[3] ** 2))) / 6;
    i1sq += (h * (x[1] ** 2 + 4 * i1m ** 2 + xn[1] ** 2)) / 6;
    x = xn;
    t += h;
    peak = Math.max(peak, Math.abs(x[1]));
    if (tank) vcap = Math.max(vcap, Math.abs(x[0] * inv1));
    vsec = Math.max(vsec, Math.abs(x[2] / c.C2));
    ibase = Math.max(ibase, Math.abs(x[3]));
    if (k % every === 0 || k === n - 1) {
      time.push(t);
      primaryCurrent.push(x[1]);
      secondaryVoltage.push(x[2] / c.C2);
    }
    if (peak >= limit) {
      tripAt = t;
      if (time[time.length - 1] !== t) {
        time.push(t);
        primaryCurrent.push(x[1]);
        secondaryVoltage.push(x[2] / c.C2);
      }
      break;
    }
  }
  const stored = 0.5 * c.L1 * x[1] ** 2 + c.M * x[1] * x[3] + 0.5 * c.L2 * x[3] ** 2 + (tank ? (0.5 * x[0] ** 2) / c.C1! : 0) + (0.5 * x[2] ** 2) / c.C2;
  const duration = t;
  const busDroop =
    s.busCapacitance === null ? null : Math.max(0, drawn) / (s.busCapacitance * s.busVoltage);
  return {
    primaryFrequency: f,
    surgeImpedance: tank ? Math.sqrt(c.L1 / c.C1!) : null,
    peakPrimaryCurrent: peak,
    timeToCurrentLimit: tripAt,
    capacitorPeakVoltage: tank ? vcap : null,
    capacitorRmsCurrent: tank ? Math.sqrt(i1sq * s.repetitionRate) : null,
    secondaryPeakVoltage: vsec,
    baseCurrentPeak: ibase,
    burstEnergy: drawn,
    averagePower: drawn * s.repetitionRate,
    dutyCycle: duration * s.repetitionRate,
    busDroop,
    switchingInstants: switching,
    energyBalance: { drawn, stored, dissipated, relativeError: drawn === 0 ? 0 : Math.abs(drawn - stored - dissipated) / Math.abs(drawn) },
    waveform: { time, primaryCurrent, secondaryVoltage },
    stepsPerPeriod: STEPS_PER_PERIOD,
  };
}
