import { EPSILON_0 } from '../constants';

/**
 * Capacitance of an isolated conducting sphere, C = 4πε0a, in F (standard closed form).
 * Domain: radius > 0. @example capacitanceSphere(0.15) // ≈ 1.6690e-11 (16.69 pF)
 */
export function capacitanceSphere(radius: number): number {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new RangeError(`sphere radius must be positive, got ${radius}`);
  return 4 * Math.PI * EPSILON_0 * radius;
}

/**
 * Capacitance of a conducting sphere whose centre is at height h above an infinite grounded plane, in F.
 *
 * Method: Kelvin's image charges summed in closed form, C = 4πε0·a·sinh α·Σ_(n≥1) 1/sinh(nα) with
 * cosh α = h/a (W. R. Smythe, "Static and Dynamic Electricity", 3rd ed., 1968, ch. 5, from memory).
 * The series is summed until a term falls below 1e-17 of the sum; it converges slowly as the sphere
 * approaches the plane (the capacitance diverges logarithmically at contact).
 *
 * Domain: centreHeight > radius > 0; h/a − 1 ≥ 1e-6 to bound the work.
 * @example capacitanceSphereOverPlane(0.15, 1.0) // ≈ 1.8044e-11 (1.081 × the isolated value)
 */
export function capacitanceSphereOverPlane(radius: number, centreHeight: number): number {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new RangeError(`sphere radius must be positive, got ${radius}`);
  if (!(centreHeight > radius * (1 + 1e-6)) || !Number.isFinite(centreHeight)) {
    throw new RangeError('the sphere must be clear of the ground plane (centre height > radius)');
  }
  const alpha = Math.acosh(centreHeight / radius);
  let sum = 0;
  for (let n = 1; n < 10_000_000; n++) {
    const term = 1 / Math.sinh(n * alpha);
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return 4 * Math.PI * EPSILON_0 * radius * Math.sinh(alpha) * sum;
}
