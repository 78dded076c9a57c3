import { METRES_PER_INCH, MU_0 } from '../constants';
import { ellipKEComplementary, ellipKMinusE } from '../math/ellip';

/**
 * Nagaoka's coefficient K_L of a cylindrical current sheet, as a function of diameter / length.
 *
 * Method: Lorenz's closed form, K_L = 4/(3π k′)·[(k′²/k²)(K − E) + E − k] with k² = D²/(D² + ℓ²),
 * k′² = ℓ²/(D² + ℓ²), K and E the complete elliptic integrals of parameter k² (H. Nagaoka, "The
 * inductance coefficients of solenoids", J. Coll. Sci. Imp. Univ. Tokyo 27, 1909; L. Lorenz, Ann.
 * Phys. Chem. 7, 1879; both from memory). K − E is taken from the AGM sum so long coils keep full
 * accuracy. Exact for the sheet model.
 *
 * Domain: D/ℓ > 0 (tested 1e-3 … 1e3). Limits: → 1 for long coils, → 0 for short ones.
 * @example nagaokaCoefficient(1) // 0.6884226 (Nagaoka's table: 0.6884)
 */
export function nagaokaCoefficient(diameterOverLength: number): number {
  const x = diameterOverLength;
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`diameter/length must be positive and finite, got ${x}`);
  const x2 = x * x;
  const mc = 1 / (1 + x2);
  const m = x2 / (1 + x2);
  const k = Math.sqrt(m);
  const kp = Math.sqrt(mc);
  const { E } = ellipKEComplementary(mc);
  const kMinusE = ellipKMinusE(m);
  return (4 / (3 * Math.PI * kp)) * ((mc / m) * kMinusE + E - k);
}

/**
 * Inductance of a single-layer solenoid modelled as a uniform current sheet (Lorenz), in H.
 *
 * L = μ0 π r² N² K_L / ℓ with K_L = {@link nagaokaCoefficient}(2r/ℓ). Assumes the current flows
 * purely azimuthally in an infinitely thin sheet at radius r (the wire centres); pitch (helicity)
 * and the round-wire shape are ignored (see {@link rosaCorrection}).
 *
 * Domain: turns > 0, radius > 0, length > 0. @example inductanceSolenoidLorenz(1000, 0.05, 0.5) // ≈ 0.018162 (18.16 mH)
 */
export function inductanceSolenoidLorenz(turns: number, radius: number, length: number): number {
  checkCoil(turns, radius, length);
  return (MU_0 * Math.PI * radius * radius * turns * turns * nagaokaCoefficient((2 * radius) / length)) / length;
}

/**
 * Rosa's mutual-inductance correction B(N) of a round-wire solenoid (Grover's k_m).
 *
 * Method: D. W. Knight's extended series, "Rosa's mutual inductance correction for the round-wire
 * solenoid" (2010, v1.03): B = ln(2π) − 3/2 − ln N/(6N) − 0.33084236/N − 1/(120N³) + 1/(504N⁵)
 * − 0.0011923/N⁷ + 0.0005068/N⁹ (coefficients from memory; reproduces Rosa's table B(2) = 0.1137,
 * B(10) = 0.2664 and is ≈ 0 at N = 1). Fractional N is accepted; B is clamped at 0 below N = 1.
 *
 * Domain: N ≥ 1. @example rosaCorrectionB(10) // ≈ 0.2664081
 */
export function rosaCorrectionB(turns: number): number {
  if (!(turns > 0)) throw new RangeError(`turns must be positive, got ${turns}`);
  if (turns <= 1) return 0;
  const n = turns;
  const n2 = n * n;
  const n3 = n2 * n;
  const n5 = n3 * n2;
  const b =
    Math.log(2 * Math.PI) -
    1.5 -
    Math.log(n) / (6 * n) -
    0.33084236 / n -
    1 / (120 * n3) +
    1 / (504 * n5) -
    0.0011923 / (n5 * n2) +
    0.0005068 / (n5 * n3 * n);
  return Math.max(0, b);
}

/**
 * Rosa's self-inductance correction A for a round wire of bare diameter d at pitch p.
 *
 * A = 5/4 − ln(2p/d) at low frequency (uniform current; wire GMD e^(−1/4)·d/2) and
 * A = 3/2 − ln(2p/d) at high frequency (surface current, no internal inductance). E. B. Rosa,
 * "Calculation of the self-inductance of single-layer coils", Bull. Bur. Stand. 2(2), 1906 (from
 * memory); the HF form re-derived from the geometric mean distances.
 *
 * Domain: pitch ≥ d > 0. @example rosaCorrectionA(1e-3, 1e-3, false) // ≈ 0.5568528
 */
export function rosaCorrectionA(pitch: number, bareDiameter: number, highFrequency = true): number {
  if (!(pitch > 0) || !(bareDiameter > 0)) throw new RangeError('pitch and bare diameter must be positive');
  return (highFrequency ? 1.5 : 1.25) - Math.log((2 * pitch) / bareDiameter);
}

/**
 * Rosa's round-wire correction ΔL = μ0 r N (A + B) to subtract from the current-sheet inductance, in H.
 *
 * See {@link rosaCorrectionA} and {@link rosaCorrectionB}. Both corrections together turn the sheet
 * into N round-wire turns; helicity is still neglected (Knight, "Solenoid inductance calculation",
 * 2016, from memory). Can be negative for widely spaced thick wire.
 *
 * Domain: turns ≥ 1, radius > 0, pitch ≥ bareDiameter > 0.
 * @example rosaCorrection(12, 0.15, 0.0127, 0.00635, false) // ≈ 3.155e-7 H
 */
export function rosaCorrection(
  turns: number,
  radius: number,
  pitch: number,
  bareDiameter: number,
  highFrequency = true,
): number {
  return MU_0 * radius * turns * (rosaCorrectionA(pitch, bareDiameter, highFrequency) + rosaCorrectionB(turns));
}

/**
 * Inductance of a single-layer round-wire solenoid at high frequency, in H: Lorenz − Rosa.
 *
 * {@link inductanceSolenoidLorenz} minus {@link rosaCorrection} with pitch = length / turns and the
 * high-frequency A term (skin depth ≪ wire radius, as in a resonating secondary). The Rosa-corrected
 * sheet matches an explicit ring-filament sum to about 0.02 % for a 12-turn helix (E. B. Rosa, Bull. Bur. Stand. 2(2), 1906, from
 * memory; F. W. Grover, Inductance Calculations, 1946, from memory; the ring sum by scipy quadrature in
 * scripts/fixtures/worked_examples.py).
 *
 * Domain: turns ≥ 1, radius > 0, length ≥ turns·bareDiameter.
 * @example inductanceSolenoidRoundWire(12, 0.15, 0.1524, 0.00635) // ≈ 4.3548e-5
 */
export function inductanceSolenoidRoundWire(turns: number, radius: number, length: number, bareDiameter: number): number {
  checkCoil(turns, radius, length);
  return inductanceSolenoidLorenz(turns, radius, length) - rosaCorrection(turns, radius, length / turns, bareDiameter, true);
}

/**
 * Wheeler's 1928 single-layer formula, in H, from SI inputs.
 *
 * The printed form L[µH] = a²N²/(9a + 10b) with a = radius and b = length in inches (H. A. Wheeler,
 * "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928, from memory), converted
 * exactly: L = (1e-6 / 0.0254 m)·r²N²/(9r + 10ℓ). The often-quoted SI variant μ0πr²N²/(ℓ + 0.9r) is
 * 0.276 % higher (J. Crabtree & D. Knight, "Wheeler's formulae", 2019). About 1 % accurate for
 * ℓ > 0.8r (from memory).
 *
 * Domain: turns > 0, radius > 0, length > 0. @example inductanceSolenoidWheeler1928(12, 0.15, 0.1524) // ≈ 4.4384e-5
 */
export function inductanceSolenoidWheeler1928(turns: number, radius: number, length: number): number {
  checkCoil(turns, radius, length);
  return ((1e-6 / METRES_PER_INCH) * radius * radius * turns * turns) / (9 * radius + 10 * length);
}

/**
 * Wheeler's 1982 continuous formula for a current-sheet solenoid of any proportions, in H.
 *
 * L = μ0 N² r {ln(1 + πr/ℓ) + 1/[2.3004 + 3.437(ℓ/D) + 1.7636(ℓ/D)² − 0.47/(0.755 + D/ℓ)^1.44]}
 * (H. A. Wheeler, "Inductance formulas for circular and square coils", Proc. IEEE 70(12), 1982;
 * reconstructed from memory, verified numerically: within 2.2e-5 of Lorenz for D/ℓ = 0.01…100,
 * exact in both limits).
 *
 * Domain: turns > 0, radius > 0, length > 0. @example inductanceSolenoidWheeler1982(1000, 0.05, 0.5) // ≈ 0.018162
 */
export function inductanceSolenoidWheeler1982(turns: number, radius: number, length: number): number {
  checkCoil(turns, radius, length);
  const lOverD = length / (2 * radius);
  const dOverL = 1 / lOverD;
  const denom = 2.3004 + 3.437 * lOverD + 1.7636 * lOverD * lOverD - 0.47 / Math.pow(0.755 + dOverL, 1.44);
  return MU_0 * turns * turns * radius * (Math.log(1 + (Math.PI * radius) / length) + 1 / denom);
}

function checkCoil(turns: number, radius: number, length: number): void {
  if (!(turns > 0) || !Number.isFinite(turns)) throw new RangeError(`turns must be positive, got ${turns}`);
  if (!(radius > 0) || !Number.isFinite(radius)) throw new RangeError(`radius must be positive, got ${radius}`);
  if (!(length > 0) || !Number.isFinite(length)) throw new RangeError(`length must be positive, got ${length}`);
}
