import { gaussLegendre } from '../math/gauss';
import { mutualInductanceLoops } from '../primary/inductance';

/** A single-layer secondary as a uniform current sheet: wire-centre radius, bottom height, length, turns (SI). */
export type SecondarySheet = { radius: number; z0: number; length: number; turns: number };

const RULE = gaussLegendre(8);

/**
 * Mutual inductance between a circular filament and a coaxial uniform cylindrical current sheet, in H.
 *
 * M = (N/ℓ)∫_(z0)^(z0+ℓ) M_Maxwell(ringR, sheetRadius, |ringZ − z|) dz: the sheet of N turns over
 * length ℓ as a continuum of filaments (the current-sheet model of the secondary; Grover, "Inductance
 * Calculations", 1946, treats the same integral in closed form, from memory). Quadrature: the range
 * is split at ringZ, and each side is covered outward from the ring by 8-point Gauss–Legendre panels
 * whose length never exceeds the distance to the integrand's nearest complex singularity,
 * √(x² + (ringR − sheetRadius)²), so the error stays near 1e-10 even for a ring on the sheet itself
 * (the first panel is graded towards the logarithmic end point). About 20–100 Maxwell evaluations.
 *
 * Domain: ringR > 0, sheetRadius > 0, sheetLength > 0, sheetTurns > 0.
 * @example mutualInductanceRingSheet(0.2, 0, 0.05, 0.01, 0.5, 1000) // ≈ 8.687e-6
 */
export function mutualInductanceRingSheet(
  ringR: number,
  ringZ: number,
  sheetRadius: number,
  sheetZ0: number,
  sheetLength: number,
  sheetTurns: number,
): number {
  if (!(ringR > 0) || !(sheetRadius > 0) || !(sheetLength > 0) || !(sheetTurns > 0)) {
    throw new RangeError('ring radius, sheet radius, sheet length and turns must be positive');
  }
  if (!Number.isFinite(ringZ) || !Number.isFinite(sheetZ0) || !Number.isFinite(sheetLength)) {
    throw new RangeError('heights and lengths must be finite');
  }
  const za = sheetZ0 - ringZ;
  const zb = sheetZ0 + sheetLength - ringZ;
  // Work in x = z − ringZ; the integrand depends on |x| only.
  let integral: number;
  if (za >= 0) integral = integrateDistance(ringR, sheetRadius, za, zb);
  else if (zb <= 0) integral = integrateDistance(ringR, sheetRadius, -zb, -za);
  else integral = integrateDistance(ringR, sheetRadius, 0, -za) + integrateDistance(ringR, sheetRadius, 0, zb);
  return (sheetTurns / sheetLength) * integral;
}

/** ∫_(x0)^(x1) M(a, b, x) dx for 0 ≤ x0 < x1, on panels graded away from x = 0. */
function integrateDistance(a: number, b: number, x0: number, x1: number): number {
  const gap = Math.abs(a - b);
  const floor = 1e-6 * Math.min(a, b);
  const { x, w } = RULE;
  let total = 0;
  let lo = x0;
  let first = true;
  while (lo < x1) {
    const reach = Math.max(Math.hypot(lo, gap), floor);
    const hi = Math.min(x1, lo + reach);
    const half = 0.5 * (hi - lo);
    let sum = 0;
    if (first && lo === 0 && gap < floor) {
      // Near-coincident filaments: cubic grading towards the log end point at lo.
      for (let k = 0; k < x.length; k++) {
        const u = 0.5 * (x[k] + 1);
        const xi = lo + 2 * half * u * u * u;
        sum += 3 * u * u * w[k] * mutualInductanceLoops(a, b, xi);
      }
    } else {
      for (let k = 0; k < x.length; k++) sum += w[k] * mutualInductanceLoops(a, b, lo + half * (x[k] + 1));
    }
    total += sum * half;
    lo = hi;
    first = false;
  }
  return total;
}

/**
 * Mutual inductance between a primary (rings with optional weights) and a secondary current sheet, in H.
 *
 * Σᵢ wᵢ·{@link mutualInductanceRingSheet}: the Maxwell/Kirchhoff double sum (F. W. Grover, Inductance
 * Calculations, 1946, from memory) with the secondary's turns
 * as a continuous sheet. Rings come from primaryRings/primaryRingsAtTap; weight defaults to 1.
 * @example mutualPrimarySecondary([{ r: 0.2, z: 0 }], { radius: 0.05, z0: 0.01, length: 0.5, turns: 1000 }) // ≈ 8.687e-6
 */
export function mutualPrimarySecondary(
  rings: ReadonlyArray<{ r: number; z: number; weight?: number }>,
  secondary: SecondarySheet,
): number {
  let M = 0;
  for (const ring of rings) {
    const w = ring.weight ?? 1;
    if (w === 0) continue;
    M += w * mutualInductanceRingSheet(ring.r, ring.z, secondary.radius, secondary.z0, secondary.length, secondary.turns);
  }
  return M;
}

/**
 * Coupling coefficient k = M / √(L1 L2) (dimensionless, 0 ≤ |k| ≤ 1 for physical inductances).
 * Domain: L1 > 0, L2 > 0. @example couplingCoefficient(1e-5, 5e-5, 0.02) // ≈ 0.01
 */
export function couplingCoefficient(M: number, L1: number, L2: number): number {
  if (!(L1 > 0) || !(L2 > 0) || !Number.isFinite(M)) throw new RangeError('couplingCoefficient needs L1, L2 > 0 and finite M');
  return M / Math.sqrt(L1 * L2);
}

/**
 * Coupling coefficient as the secondary is raised or lowered: k at each bottom height in `elevations` (m).
 *
 * L1 and L2 do not depend on the relative position, so only M is recomputed per point.
 * @example couplingVsElevation(rings, sheet, L1, L2, [0, 0.05, 0.1]) // three k values, falling
 */
export function couplingVsElevation(
  rings: ReadonlyArray<{ r: number; z: number; weight?: number }>,
  secondary: SecondarySheet,
  L1: number,
  L2: number,
  elevations: readonly number[],
): number[] {
  return elevations.map((z0) => couplingCoefficient(mutualPrimarySecondary(rings, { ...secondary, z0 }), L1, L2));
}
