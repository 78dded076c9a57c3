import { EPSILON_0, METRES_PER_INCH } from '../constants';

/**
 * Capacitance of an isolated conducting ring torus, in F: the exact toroidal-harmonic series.
 *
 * C = 8ε0·c·Σ_(n≥0) ε_n Q_(n−½)(cosh η0) / P_(n−½)(cosh η0), c = √(R² − r²), cosh η0 = R/r,
 * ε_0 = 1, ε_n = 2 (W. R. Smythe, "Static and Dynamic Electricity", 3rd ed., 1968; V. Belevitch &
 * J. Boersma, "Some electrical problems for a torus", Philips J. Res. 38, 1983; both from memory;
 * re-derived from DLMF §14.19). The Legendre functions of half-integer degree come from their
 * integral representations DLMF 14.19.4 and 14.19.5, evaluated with the trapezoidal rule, which
 * converges geometrically here because both integrands are smooth, even and (for P) periodic.
 *
 * Domain: R > r > 0 (R centre-line radius of the tube, r tube radius).
 * @example capacitanceTorusIsolated(0.3, 0.075) // ≈ 3.110706e-11 (31.10706 pF)
 */
export function capacitanceTorusIsolated(majorRadiusCentre: number, tubeRadius: number): number {
  const R = majorRadiusCentre;
  const r = tubeRadius;
  if (!(r > 0) || !(R > r) || !Number.isFinite(R)) {
    throw new RangeError('torus needs centre-line radius R greater than tube radius r > 0');
  }
  const c = Math.sqrt((R - r) * (R + r));
  const eta = Math.acosh(R / r);
  let sum = 0;
  for (let n = 0; n < 400; n++) {
    const term = (n === 0 ? 1 : 2) * (legendreQHalf(n, eta) / legendrePHalf(n, eta));
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return 8 * EPSILON_0 * c * sum;
}

/**
 * Toroidal (ring) Legendre function P_(n−½)(cosh ξ) of the first kind (DLMF 14.19.4):
 * (1/π)∫₀^π (cosh ξ + sinh ξ cos φ)^(−n−½) dφ, by the trapezoidal rule with M = (40 + 2n)/d nodes,
 * d = arccosh(coth ξ) the distance of the integrand's singularity from the real axis, so the
 * geometric error bound exp(−2Md) is far below rounding.
 * Domain: integer n ≥ 0, ξ > 0. @example legendrePHalf(0, Math.acosh(3)) // ≈ 0.83463 (P_(−½)(3))
 */
export function legendrePHalf(n: number, xi: number): number {
  const sh = Math.sinh(xi);
  const emx = Math.exp(-xi);
  const d = Math.acosh(1 / Math.tanh(xi));
  const M = Math.min(200_000, Math.max(16, Math.ceil((40 + 2 * n) / d)));
  const p = -n - 0.5;
  // cosh ξ + sinh ξ cos φ written as e^(−ξ) + 2 sinh ξ cos²(φ/2): a sum of positives, no cancellation near φ = π.
  const base = (phi: number): number => {
    const c = Math.cos(0.5 * phi);
    return emx + 2 * sh * c * c;
  };
  let sum = 0.5 * (Math.pow(base(0), p) + Math.pow(emx, p));
  for (let j = 1; j < M; j++) sum += Math.pow(base((Math.PI * j) / M), p);
  return sum / M;
}

/**
 * Toroidal Legendre function Q_(n−½)(cosh ξ) of the second kind (DLMF 14.19.5):
 * ∫₀^∞ (cosh ξ + sinh ξ cosh t)^(−n−½) dt, by the trapezoidal rule with step 4/(10 + n) (the
 * integrand's nearest complex singularity is at imaginary distance π, so the error is about
 * e^(−2π²/h), times a growth factor that rises with n), truncated where the integrand has fallen
 * below 1e-18 of its peak.
 * Domain: integer n ≥ 0, ξ > 0. @example legendreQHalf(0, Math.acosh(3)) // ≈ 1.31103 (π/2 × P_(−½)(3))
 */
export function legendreQHalf(n: number, xi: number): number {
  const ch = Math.cosh(xi);
  const sh = Math.sinh(xi);
  const p = -n - 0.5;
  const h = 4 / (10 + n);
  const f0 = Math.pow(ch + sh, p);
  let sum = 0.5 * f0;
  for (let j = 1; j < 100_000; j++) {
    const f = Math.pow(ch + sh * Math.cosh(j * h), p);
    sum += f;
    if (f < 1e-18 * f0) break;
  }
  return sum * h;
}

/**
 * The trade's empirical toroid-topload formula, in F (common practice; no primary physics source).
 *
 * C = 2.8 pF/in × (1.2781 − d/D) × √(π (D − d) d / 4), lengths in inches, D the overall outside
 * diameter and d the tube (minor) diameter; here converted to SI (2.8 pF per inch = 1.1024e-10 F/m).
 * The square root is the radius of the sphere with the torus's surface area. For an isolated torus
 * it is within about 7 % of {@link capacitanceTorusIsolated} for d/D = 0.1–0.35 and falls further
 * below for fatter tori (tests check within 10 % over 0.1–0.35). It ignores the ground and the
 * coil, which add capacitance (see toploadCapacitance).
 *
 * Domain: majorOuterDiameter > 2·minorDiameter > 0.
 * @example capacitanceToroidEmpirical(0.75, 0.15) // ≈ 3.16e-11 (31.6 pF)
 */
export function capacitanceToroidEmpirical(majorOuterDiameter: number, minorDiameter: number): number {
  const D = majorOuterDiameter;
  const d = minorDiameter;
  if (!(d > 0) || !(D > 2 * d) || !Number.isFinite(D)) {
    throw new RangeError('toroid needs outside diameter greater than twice the tube diameter');
  }
  return (2.8e-12 / METRES_PER_INCH) * (1.2781 - d / D) * Math.sqrt((Math.PI * (D - d) * d) / 4);
}
