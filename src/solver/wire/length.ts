/**
 * Length of wire in a uniform single-layer helix, in metres: turns × √((π D)² + pitch²).
 *
 * Each turn is one revolution around a circle of diameter D (the wire-centre diameter) plus an axial
 * advance of pitch = windingLength / turns; the exact arc length of a circular helix. Leads are not
 * included. Domain: turns > 0, windingDiameter > 0, windingLength ≥ 0.
 * @example helixWireLength(1000, 0.1, 0.5) // ≈ 314.16
 */
export function helixWireLength(turns: number, windingDiameter: number, windingLength: number): number {
  if (!(turns > 0) || !(windingDiameter > 0) || !(windingLength >= 0)) {
    throw new RangeError('helixWireLength needs turns > 0, windingDiameter > 0 and windingLength ≥ 0');
  }
  const pitch = windingLength / turns;
  return turns * Math.hypot(Math.PI * windingDiameter, pitch);
}
