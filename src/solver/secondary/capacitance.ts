import { EPSILON_0 } from '../constants';
import { pchip } from '../math/pchip';

/**
 * Medhurst's table of H = C / D (pF per cm of coil diameter) against length / diameter, for
 * single-layer solenoids with one end grounded and no topload (R. G. Medhurst, "H.F. resistance and
 * self-capacitance of single-layer solenoids", Wireless Engineer 24, 1947). Entries ℓ/D = 1.0–5.0
 * confirmed by a secondary transcription; the others from memory of the table as reprinted in the
 * Radiotron Designer's Handbook, 4th ed., 1953, ch. 11.
 */
export const MEDHURST_TABLE: ReadonlyArray<{ lengthOverDiameter: number; H: number }> = [
  [0.1, 0.96], [0.15, 0.79], [0.2, 0.7], [0.25, 0.64], [0.3, 0.6], [0.35, 0.57], [0.4, 0.54],
  [0.45, 0.52], [0.5, 0.5], [0.6, 0.48], [0.7, 0.47], [0.8, 0.46], [0.9, 0.46], [1.0, 0.46],
  [1.5, 0.47], [2.0, 0.5], [2.5, 0.56], [3.0, 0.61], [3.5, 0.67], [4.0, 0.72], [4.5, 0.77],
  [5.0, 0.81], [6.0, 0.92], [7.0, 1.01], [8.0, 1.12], [9.0, 1.22], [10, 1.32], [15, 1.86],
  [20, 2.36], [25, 2.92], [30, 3.4], [40, 4.32], [50, 5.22],
].map(([lengthOverDiameter, H]) => ({ lengthOverDiameter, H }));

/** Medhurst's claimed accuracy of his formula and table (relative, about 5 %). */
export const MEDHURST_ACCURACY = 0.05;

/**
 * Largest ℓ/D at which the table is used. The remembered rows at ℓ/D = 40 and 50 (4.32, 5.22) lie below the
 * long-coil limit 4ε0ℓ/π (4.51 and 5.64 pF per cm of diameter; REFERENCES b1–b2, Knight 2013), which every
 * long single-layer coil exceeds, so they are not used.
 */
export const MEDHURST_TABLE_MAX = 30;

/** The long-coil slope 4ε0/π in pF per cm of diameter per unit of ℓ/D (0.11273). */
export const LONG_COIL_SLOPE = (4 * EPSILON_0) / Math.PI / 1e-10;

const used = MEDHURST_TABLE.filter((row) => row.lengthOverDiameter <= MEDHURST_TABLE_MAX);
const lnX = used.map((row) => Math.log(row.lengthOverDiameter));
const interpolateH = pchip(lnX, used.map((row) => row.H));
const first = used[0];
const last = used[used.length - 1];

/**
 * Self-capacitance of a single-layer solenoid from Medhurst's table, in F.
 *
 * C = H·D with H in pF/cm, interpolated by PCHIP (shape-preserving monotone cubic, Fritsch–Carlson)
 * in ln(ℓ/D) through {@link MEDHURST_TABLE} up to ℓ/D = {@link MEDHURST_TABLE_MAX}; 1 pF/cm = 1e-10 F/m.
 * Outside ℓ/D = 0.1–30 `inRange` is false: above 30 H rises from H(30) at the long-coil slope 4ε0/π
 * ({@link LONG_COIL_SLOPE}), so it stays above the limit 4ε0ℓ/π; below 0.1 H is held at 0.96, which
 * underestimates very short coils. Medhurst's coils were on solid polystyrene rods; a coil on a thin pipe is
 * lower, by 10–30 % (Knight 2013): the field model (field/model.ts) treats the former explicitly.
 * Accuracy about 5 % ({@link MEDHURST_ACCURACY}) for his rods.
 *
 * Domain: diameter > 0, length > 0 (wire-centre diameter and winding length).
 * @example selfCapacitanceMedhurst(0.1, 0.5) // { capacitance: 8.1e-12, inRange: true }
 */
export function selfCapacitanceMedhurst(diameter: number, length: number): { capacitance: number; inRange: boolean } {
  if (!(diameter > 0) || !Number.isFinite(diameter)) throw new RangeError(`diameter must be positive, got ${diameter}`);
  if (!(length > 0) || !Number.isFinite(length)) throw new RangeError(`length must be positive, got ${length}`);
  const x = length / diameter;
  let H: number;
  let inRange = true;
  if (x < first.lengthOverDiameter) {
    H = first.H;
    inRange = false;
  } else if (x > last.lengthOverDiameter) {
    H = last.H + LONG_COIL_SLOPE * (x - last.lengthOverDiameter);
    inRange = false;
  } else {
    H = interpolateH(Math.log(x));
  }
  return { capacitance: H * diameter * 1e-10, inRange };
}

/**
 * Self-capacitance of a single-layer solenoid by D. W. Knight's corrected Medhurst formula, in F.
 *
 * C = (4ε0εx/π)·ℓ·[1 + k_c(1 + εi/εx)/2]/cos²ψ, k_c = 0.717439(D/ℓ) + 0.933048(D/ℓ)^1.5 + 0.106(D/ℓ)²
 * (D. W. Knight, "The self-resonance and self-capacitance of solenoid coils", v0.04, 2013, §5;
 * structure confirmed, coefficients from memory). εx and εi are the relative permittivities outside
 * and inside the coil (1 for an air core), ψ the pitch angle. A cross-check only: with εi = 2.5
 * (Medhurst's polystyrene rods) it is within a few per cent of {@link MEDHURST_TABLE} for
 * ℓ/D = 0.1–10.
 *
 * Domain: diameter > 0, length > 0. @example selfCapacitanceKnight(0.1, 0.5) // ≈ 6.94e-12
 */
export function selfCapacitanceKnight(
  diameter: number,
  length: number,
  options: { innerPermittivity?: number; outerPermittivity?: number; pitchAngle?: number } = {},
): number {
  if (!(diameter > 0) || !(length > 0)) throw new RangeError('diameter and length must be positive');
  const ei = options.innerPermittivity ?? 1;
  const ex = options.outerPermittivity ?? 1;
  const psi = options.pitchAngle ?? 0;
  const r = diameter / length;
  const kc = 0.717439 * r + 0.933048 * Math.pow(r, 1.5) + 0.106 * r * r;
  const cos = Math.cos(psi);
  return ((4 * EPSILON_0 * ex) / Math.PI) * length * (1 + (kc * (1 + ei / ex)) / 2) / (cos * cos);
}
