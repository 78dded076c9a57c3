import { METRES_PER_INCH, MU_0 } from '../constants';
import { ellipMaxwellCombination } from '../math/ellip';
import { inductanceSolenoidWheeler1928 } from '../secondary/inductance';
import { type PrimaryGeometry, primaryRingsAtTap, validatePrimary } from './geometry';

/**
 * Self-inductance of a circular loop of round wire, in H (Kirchhoff's formula).
 *
 * L = μ0 R [ln(8R/a) − 2] at high frequency (current on the surface) or μ0 R [ln(8R/a) − 7/4] at low
 * frequency (uniform current), R the loop radius to the wire centre and a the wire radius (J. C.
 * Maxwell, "A Treatise on Electricity and Magnetism", 1873, vol. 2; E. B. Rosa & F. W. Grover,
 * "Formulas and tables for the calculation of mutual and self-inductance", Bull. Bur. Stand. 8, 1912;
 * both from memory). Both follow from Maxwell's M at the wire's geometric mean distance; they neglect
 * terms O(a²/R²) (about 1e-4 relative for a/R = 0.02).
 *
 * Domain: R > a > 0 (useful for a ≪ R). @example inductanceLoopRoundWire(0.15, 0.003175) // ≈ 7.4169e-7
 */
export function inductanceLoopRoundWire(R: number, wireRadius: number, highFrequency = true): number {
  if (!(wireRadius > 0) || !(R > wireRadius) || !Number.isFinite(R)) {
    throw new RangeError('loop radius must exceed the wire radius, both positive');
  }
  return MU_0 * R * (Math.log((8 * R) / wireRadius) - (highFrequency ? 2 : 1.75));
}

/**
 * Mutual inductance of two coaxial circular filaments of radii a and b, axial separation d, in H.
 *
 * Maxwell's formula M = μ0√(ab)[(2/k − k)K(k) − (2/k)E(k)], k² = 4ab/((a+b)² + d²) (J. C. Maxwell,
 * "A Treatise on Electricity and Magnetism", 1873, vol. 2, art. 701). Written as
 * M = μ0√(ab)·(2/k)·[(1 − k²/2)K − E] with both k² and 1 − k² formed without subtraction, so it
 * keeps full accuracy for distant filaments (M ~ μ0π a²b²/(2d³)) and for nearly touching ones.
 *
 * Domain: a > 0, b > 0, d real; a = b with d = 0 is the singular self term (returns Infinity).
 * @example mutualInductanceLoops(0.1, 0.1, 0.01) // ≈ 3.0029e-7
 */
export function mutualInductanceLoops(a: number, b: number, d: number): number {
  if (!(a > 0) || !(b > 0) || !Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(d)) {
    throw new RangeError('filament radii must be positive and the separation finite');
  }
  const sum = a + b;
  const diff = a - b;
  const den = sum * sum + d * d;
  const m = (4 * a * b) / den;
  const mc = (diff * diff + d * d) / den;
  if (mc === 0) return Infinity;
  const k = Math.sqrt(m);
  return MU_0 * Math.sqrt(a * b) * (2 / k) * ellipMaxwellCombination(m, mc);
}

/**
 * Inductance of a primary (flat, helical or conical) tapped `tapTurns` turns from its inner end, in H.
 *
 * Method: the ring model (Maxwell/Kirchhoff summation; F. W. Grover, Inductance Calculations, 1946, from memory): L = Σᵢ wᵢ² L_loop(rᵢ) + Σ_(i≠j) wᵢwⱼ M(rᵢ, rⱼ, |zᵢ − zⱼ|)
 * with rings and weights from {@link primaryRingsAtTap}, the high-frequency loop formula (skin depth at
 * the operating frequency ≪ conductor radius, true for copper tubing at tens of kHz and above) and
 * Maxwell's M. Assumes thin conductors (radius ≪ pitch is not required, radius ≪ r is). Reproduces
 * the ring-model worked examples (flat 52.38 µH, 30° cone 48.08 µH, helix 43.54 µH) computed independently by
 * scipy 1.17.1 quadrature of Neumann's integral (scripts/fixtures/worked_examples.py).
 *
 * Domain: a valid primary; 0 ≤ tapTurns ≤ turns (default all turns).
 * @example inductancePrimary({ shape: 'flat', innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 }) // ≈ 5.2376e-5
 */
export function inductancePrimary(p: PrimaryGeometry, tapTurns: number = p.turns, highFrequency = true): number {
  const rings = primaryRingsAtTap(p, tapTurns);
  const a = 0.5 * p.conductorDiameter;
  let L = 0;
  for (let i = 0; i < rings.length; i++) {
    const ri = rings[i];
    L += ri.weight * ri.weight * inductanceLoopRoundWire(ri.r, a, highFrequency);
    for (let j = i + 1; j < rings.length; j++) {
      const rj = rings[j];
      L += 2 * ri.weight * rj.weight * mutualInductanceLoops(ri.r, rj.r, rj.z - ri.z);
    }
  }
  return L;
}

/**
 * Wheeler's 1928 flat-spiral formula, in H, from SI inputs.
 *
 * The printed form L[µH] = a²N²/(8a + 11c), a = mean radius and c = radial width in inches (H. A.
 * Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928, from memory),
 * converted exactly: L = (1e-6/0.0254 m)·a²N²/(8a + 11c). About 5 % accurate for c > 0.2a (from memory).
 *
 * Domain: meanRadius > 0, turns > 0, radialWidth > 0.
 * @example inductanceFlatSpiralWheeler(0.16985, 12, 0.1524) // ≈ 5.389e-5
 */
export function inductanceFlatSpiralWheeler(meanRadius: number, turns: number, radialWidth: number): number {
  if (!(meanRadius > 0) || !(turns > 0) || !(radialWidth > 0)) {
    throw new RangeError('mean radius, turns and radial width must be positive');
  }
  return ((1e-6 / METRES_PER_INCH) * meanRadius * meanRadius * turns * turns) / (8 * meanRadius + 11 * radialWidth);
}

/**
 * Wheeler-formula cross-check of a primary's inductance, in H, or null for a cone (no formula).
 *
 * Flat: {@link inductanceFlatSpiralWheeler} with a = mean of the innermost and outermost ring radii and
 * c = turns × pitch. Helical: {@link inductanceSolenoidWheeler1928} with length = turns × pitch. These are
 * the inputs of the worked examples (flat 53.89 µH, helix 44.38 µH; scripts/fixtures/worked_examples.py).
 * @example inductancePrimaryWheeler({ shape: 'helical', innerDiameter: 0.3, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 }) // ≈ 4.4384e-5
 */
export function inductancePrimaryWheeler(p: PrimaryGeometry): number | null {
  validatePrimary(p);
  const pitch = p.conductorDiameter + p.spacing;
  const r0 = 0.5 * p.innerDiameter;
  if (p.shape === 'helical') return inductanceSolenoidWheeler1928(p.turns, r0, p.turns * pitch);
  if (p.shape === 'flat') {
    const outer = r0 + (Math.ceil(p.turns) - 1) * pitch;
    return inductanceFlatSpiralWheeler(0.5 * (r0 + outer), p.turns, p.turns * pitch);
  }
  return null;
}
