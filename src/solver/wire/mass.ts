import { COPPER_DENSITY } from '../constants';

/**
 * Mass of a solid round copper conductor, in kg: density × π d²/4 × length.
 *
 * Assumes annealed copper at 8890 kg/m³ (IEC 60028, from memory); the enamel's mass is neglected.
 * Domain: length ≥ 0, diameter > 0. @example copperMass(1000, 1.1283792e-3) // ≈ 8.89 (1 km of 1 mm²)
 */
export function copperMass(length: number, diameter: number): number {
  if (!(length >= 0) || !(diameter > 0)) throw new RangeError('copperMass needs length ≥ 0 and diameter > 0');
  return COPPER_DENSITY * 0.25 * Math.PI * diameter * diameter * length;
}
