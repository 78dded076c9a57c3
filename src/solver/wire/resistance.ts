import { COPPER_RESISTIVITY_20C, COPPER_TEMP_COEFF_20C, MU_0 } from '../constants';

/**
 * DC resistance of a solid round copper conductor, in Ω: ρ(T)·length / (π d²/4).
 *
 * ρ(T) = ρ20·(1 + α20·(T − 20 °C)) with ρ20 = 1.7241e-8 Ω·m and α20 = 0.00393 /K, annealed copper of
 * IEC 60028 (from memory). The linear temperature law is the usual engineering one, good to about
 * 1 % between −20 °C and 150 °C (common practice).
 *
 * Domain: length ≥ 0, diameter > 0, tempC > −200. @example copperResistance(1, 1.1283792e-3) // ≈ 0.017241
 */
export function copperResistance(length: number, diameter: number, tempC = 20): number {
  if (!(length >= 0) || !(diameter > 0)) throw new RangeError('copperResistance needs length ≥ 0 and diameter > 0');
  if (!(tempC > -200) || !Number.isFinite(tempC)) throw new RangeError(`temperature out of range: ${tempC} °C`);
  const rho = COPPER_RESISTIVITY_20C * (1 + COPPER_TEMP_COEFF_20C * (tempC - 20));
  return (rho * length) / (0.25 * Math.PI * diameter * diameter);
}

/**
 * Skin depth δ = √(ρ / (π f μ0 μr)) of a non-magnetic conductor (μr = 1), in metres.
 *
 * The depth at which a plane wave's current density in a good conductor falls by 1/e (standard
 * result, e.g. S. Ramo, J. R. Whinnery & T. Van Duzer, "Fields and Waves in Communication
 * Electronics", 3rd ed., 1994, §3.16, from memory). Domain: f > 0, resistivity > 0.
 * @example skinDepth(100e3) // ≈ 2.0898e-4 (0.2090 mm for copper)
 */
export function skinDepth(f: number, resistivity: number = COPPER_RESISTIVITY_20C): number {
  if (!(f > 0) || !(resistivity > 0)) throw new RangeError('skinDepth needs f > 0 and resistivity > 0');
  return Math.sqrt(resistivity / (Math.PI * f * MU_0));
}

/**
 * Ratio R_ac / R_dc of an isolated straight round wire from skin effect alone.
 *
 * Method: the exact solution of the diffusion equation in a round wire, R_ac/R_dc =
 * Re[(ka/2)·J0(ka)/J1(ka)] with k = (1 − i)/δ and a = d/2 (Ramo, Whinnery & Van Duzer 1994, §5.13,
 * from memory). With q = a/δ the ratio is Re[S0/S1], S0 = Σ wⁿ/(n!)², S1 = Σ wⁿ/(n!(n+1)!),
 * w = i q²/2, summed directly for q ≤ 20 (cancellation costs at most about 4 digits there); beyond,
 * J_n ≈ H_n^(1)/2 (error e^(−2q)) with Hankel's asymptotic series (A&S 9.2.7, from memory), 16 terms,
 * so the ratio is Re[(z/2)·i·S0/S1], S_ν = Σ i^k a_k(ν)/z^k. For q ≫ 1 it approaches
 * q/2 + 1/4 + 3/(32q). Tends smoothly to 1 as f → 0.
 *
 * Assumptions: straight, isolated conductor; no proximity effect from neighbouring turns, which in a
 * close-wound solenoid raises the resistance further (Medhurst 1947; not modelled).
 * Domain: diameter > 0, f ≥ 0. @example skinEffectRatio(1e-3, 1e6) // ≈ 4.04
 */
export function skinEffectRatio(diameter: number, f: number, resistivity: number = COPPER_RESISTIVITY_20C): number {
  if (!(diameter > 0) || !(f >= 0)) throw new RangeError('skinEffectRatio needs diameter > 0 and f ≥ 0');
  if (f === 0) return 1;
  const q = (0.5 * diameter) / skinDepth(f, resistivity);
  if (q > 20) return hankelRatio(q);
  const wIm = 0.5 * q * q;
  // Terms tᵢ = wⁱ/(i!)² and uᵢ = wⁱ/(i!(i+1)!) with w purely imaginary: track real/imag parts.
  let tRe = 1;
  let tIm = 0;
  let uRe = 1;
  let uIm = 0;
  let s0Re = 1;
  let s0Im = 0;
  let s1Re = 1;
  let s1Im = 0;
  for (let i = 1; i < 200; i++) {
    // multiply by i·wIm / i²  (resp. / (i(i+1)))
    const ft = wIm / (i * i);
    const fu = wIm / (i * (i + 1));
    const ntRe = -tIm * ft;
    const ntIm = tRe * ft;
    const nuRe = -uIm * fu;
    const nuIm = uRe * fu;
    tRe = ntRe;
    tIm = ntIm;
    uRe = nuRe;
    uIm = nuIm;
    s0Re += tRe;
    s0Im += tIm;
    s1Re += uRe;
    s1Im += uIm;
    if (Math.abs(tRe) + Math.abs(tIm) < 1e-18 * (Math.abs(s0Re) + Math.abs(s0Im)) && i > wIm) break;
  }
  const den = s1Re * s1Re + s1Im * s1Im;
  return (s0Re * s1Re + s0Im * s1Im) / den;
}

/**
 * AC resistance of a straight solid round copper wire at frequency f, in Ω, at 20 °C.
 *
 * R_dc × {@link skinEffectRatio}: exact for an isolated round wire (skin effect only). For d ≫ δ it
 * approaches ρ·length / (π d δ) (current in a surface layer one skin depth thick); as f → 0 it
 * becomes the DC resistance. Proximity effect between turns is not included.
 *
 * Domain: length ≥ 0, diameter > 0, f ≥ 0. @example acResistanceRoundWire(1, 1e-3, 1e6) // ≈ 0.0888
 */
export function acResistanceRoundWire(length: number, diameter: number, f: number): number {
  return copperResistance(length, diameter) * skinEffectRatio(diameter, f);
}

/** Re[(z/2)·H0(z)/H1(z)] for z = (1 − i)q from Hankel's asymptotic expansion (large q). */
function hankelRatio(q: number): number {
  // 1/z = (1 + i)/(2q)
  const izRe = 0.5 / q;
  const izIm = 0.5 / q;
  const sum = (nu: number): [number, number] => {
    const mu = 4 * nu * nu;
    let tRe = 1;
    let tIm = 0;
    let sRe = 1;
    let sIm = 0;
    for (let k = 1; k <= 16; k++) {
      const f = (mu - (2 * k - 1) * (2 * k - 1)) / (8 * k);
      // t ← t · i · f / z
      const aRe = tRe * izRe - tIm * izIm;
      const aIm = tRe * izIm + tIm * izRe;
      tRe = -aIm * f;
      tIm = aRe * f;
      sRe += tRe;
      sIm += tIm;
    }
    return [sRe, sIm];
  };
  const [s0Re, s0Im] = sum(0);
  const [s1Re, s1Im] = sum(1);
  const den = s1Re * s1Re + s1Im * s1Im;
  const rRe = (s0Re * s1Re + s0Im * s1Im) / den;
  const rIm = (s0Im * s1Re - s0Re * s1Im) / den;
  // (z/2)·i·r with z/2 = (q − iq)/2, i·(z/2) = (q + iq)/2
  return 0.5 * q * (rRe - rIm);
}
