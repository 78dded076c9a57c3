/**
 * Bare diameter of an American Wire Gauge size, in metres.
 *
 * Method: the defining geometric progression of ASTM B258 ("Standard specification for standard
 * nominal diameters and cross-sectional areas of AWG sizes of solid round wires used as electrical
 * conductors"), d_n = 0.005 in × 92^((36 − n)/39) = 0.127 mm × 92^((36 − n)/39). Gauges 0, 00, 000
 * and 0000 are n = 0, −1, −2, −3. The standard tabulates these to at most 4 significant figures in
 * inches; this returns the unrounded progression.
 *
 * Domain: n from −3 (0000) to 56; half sizes are accepted. Outside it throws a RangeError.
 * @example awgDiameter(24) // 5.1054e-4 (0.5106 mm)
 */
export function awgDiameter(awg: number): number {
  if (!Number.isFinite(awg) || awg < AWG_MIN || awg > AWG_MAX) {
    throw new RangeError(`AWG gauge must be between ${AWG_MIN} (0000) and ${AWG_MAX}, got ${awg}`);
  }
  return 0.127e-3 * Math.pow(92, (36 - awg) / 39);
}

/** Smallest gauge number accepted: 0000 is written −3. */
export const AWG_MIN = -3;
/** Largest gauge number accepted. */
export const AWG_MAX = 56;

/**
 * The gauge number (possibly fractional) whose ASTM B258 diameter equals `diameter` (m); the inverse
 * of {@link awgDiameter}. @example awgFromDiameter(0.127e-3) // 36
 */
export function awgFromDiameter(diameter: number): number {
  if (!(diameter > 0)) throw new RangeError(`wire diameter must be positive, got ${diameter}`);
  return 36 - (39 * Math.log(diameter / 0.127e-3)) / Math.log(92);
}
