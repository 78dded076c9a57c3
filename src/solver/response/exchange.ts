/** Two lossless LC circuits coupled by a mutual inductance M = k √(L1 L2). */
export interface CoupledPair {
  L1: number;
  C1: number;
  L2: number;
  C2: number;
  k: number;
}

export interface EnergyExchangeOptions {
  /** simulated time; default two envelope nulls of the tuned pair */
  duration?: number;
  /** samples in the returned series; default 400 */
  points?: number;
  /** integration steps per primary cycle; default 200 */
  stepsPerCycle?: number;
  /** initial primary capacitor voltage; default 1 V */
  initialVoltage?: number;
}

export interface EnergyExchangeSeries {
  t: number[];
  /** ½ L1 i1² + q1²/(2 C1) */
  primaryEnergy: number[];
  /** ½ L2 i2² + q2²/(2 C2) */
  secondaryEnergy: number[];
  /** M i1 i2, the share held in the mutual field (the three sum to a constant) */
  mutualEnergy: number[];
  initialEnergy: number;
  /** time of the lowest primary energy in the first beat, from the full-resolution integration */
  firstPrimaryMinimum: number | null;
  residualPrimaryEnergy: number | null;
}

/**
 * Energy exchange in a lossless coupled pair, primary capacitor charged at t = 0, everything else at
 * rest. Integrates L·di/dt = −q/C (L the 2×2 inductance matrix) with classical fourth-order
 * Runge–Kutta. For a tuned pair the result matches the closed form q1 ∝ cos(ω_B t/2) cos(ω̄ t)
 * ("Electronics" lecture notes §2.7, eqs. 2.99–2.123, confirmed); it also handles detuned pairs, which have no such simple form.
 * Domain: 0 ≤ k < 1, all L and C positive.
 */
export function energyExchange(pair: CoupledPair, options: EnergyExchangeOptions = {}): EnergyExchangeSeries {
  const { L1, C1, L2, C2, k } = pair;
  const M = k * Math.sqrt(L1 * L2);
  const det = L1 * L2 - M * M;
  const w1 = 1 / Math.sqrt(L1 * C1);
  const w2 = 1 / Math.sqrt(L2 * C2);
  const f0 = Math.sqrt(w1 * w2) / (2 * Math.PI);
  const t1 = k > 0 ? 1 / (2 * (f0 / Math.sqrt(1 - k) - f0 / Math.sqrt(1 + k))) : Infinity;
  const duration = options.duration ?? (Number.isFinite(t1) ? 2 * t1 : 10 / f0);
  const points = Math.max(2, Math.floor(options.points ?? 400));
  const stepsPerCycle = options.stepsPerCycle ?? 200;
  const v0 = options.initialVoltage ?? 1;
  const fMax = Math.max(w1, w2) / (2 * Math.PI) / Math.sqrt(1 - k);
  const steps = Math.max(points - 1, Math.ceil(duration * fMax * stepsPerCycle));
  const h = duration / steps;

  // state: q1, q2, i1, i2
  const deriv = (q1: number, q2: number, i1: number, i2: number, out: Float64Array) => {
    const v1 = -q1 / C1;
    const v2 = -q2 / C2;
    out[0] = i1;
    out[1] = i2;
    out[2] = (L2 * v1 - M * v2) / det;
    out[3] = (L1 * v2 - M * v1) / det;
  };
  const energies = (q1: number, q2: number, i1: number, i2: number) => ({
    e1: 0.5 * L1 * i1 * i1 + (q1 * q1) / (2 * C1),
    e2: 0.5 * L2 * i2 * i2 + (q2 * q2) / (2 * C2),
    em: M * i1 * i2,
  });

  let q1 = C1 * v0;
  let q2 = 0;
  let i1 = 0;
  let i2 = 0;
  const initialEnergy = (q1 * q1) / (2 * C1);
  const k1 = new Float64Array(4);
  const k2 = new Float64Array(4);
  const k3 = new Float64Array(4);
  const k4 = new Float64Array(4);

  const t: number[] = [];
  const primaryEnergy: number[] = [];
  const secondaryEnergy: number[] = [];
  const mutualEnergy: number[] = [];
  const record = (time: number) => {
    const e = energies(q1, q2, i1, i2);
    t.push(time);
    primaryEnergy.push(e.e1);
    secondaryEnergy.push(e.e2);
    mutualEnergy.push(e.em);
  };
  record(0);

  // the deepest primary minimum of the first beat lies within a quarter cycle of t1
  const windowLo = Number.isFinite(t1) ? 0.5 * t1 : Infinity;
  const windowHi = Number.isFinite(t1) ? 1.5 * t1 : -Infinity;
  let best = Infinity;
  let bestIndex = -1;
  let prev1 = NaN;
  let bestNeighbours: [number, number, number] | null = null;

  let nextSample = 1;
  for (let n = 1; n <= steps; n++) {
    deriv(q1, q2, i1, i2, k1);
    deriv(q1 + 0.5 * h * k1[0], q2 + 0.5 * h * k1[1], i1 + 0.5 * h * k1[2], i2 + 0.5 * h * k1[3], k2);
    deriv(q1 + 0.5 * h * k2[0], q2 + 0.5 * h * k2[1], i1 + 0.5 * h * k2[2], i2 + 0.5 * h * k2[3], k3);
    deriv(q1 + h * k3[0], q2 + h * k3[1], i1 + h * k3[2], i2 + h * k3[3], k4);
    q1 += (h / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
    q2 += (h / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
    i1 += (h / 6) * (k1[2] + 2 * k2[2] + 2 * k3[2] + k4[2]);
    i2 += (h / 6) * (k1[3] + 2 * k2[3] + 2 * k3[3] + k4[3]);
    const time = n * h;

    const e1 = 0.5 * L1 * i1 * i1 + (q1 * q1) / (2 * C1);
    if (time >= windowLo && time <= windowHi && e1 < best) {
      best = e1;
      bestIndex = n;
      bestNeighbours = [prev1, e1, NaN];
    } else if (bestIndex === n - 1 && bestNeighbours) {
      bestNeighbours[2] = e1;
    }
    prev1 = e1;

    if (n >= (nextSample * steps) / (points - 1) - 1e-9) {
      record(time);
      nextSample++;
    }
  }

  let firstPrimaryMinimum: number | null = null;
  let residualPrimaryEnergy: number | null = null;
  if (bestIndex > 0 && bestNeighbours) {
    const [a, b, c] = bestNeighbours;
    let shift = 0;
    let value = b;
    const denom = a - 2 * b + c;
    // parabolic refinement between neighbouring steps
    if (Number.isFinite(a) && Number.isFinite(c) && denom > 0) {
      shift = Math.max(-1, Math.min(1, (0.5 * (a - c)) / denom));
      value = Math.max(0, b - 0.25 * (a - c) * shift);
    }
    firstPrimaryMinimum = (bestIndex + shift) * h;
    residualPrimaryEnergy = value / initialEnergy;
  }

  return { t, primaryEnergy, secondaryEnergy, mutualEnergy, initialEnergy, firstPrimaryMinimum, residualPrimaryEnergy };
}
