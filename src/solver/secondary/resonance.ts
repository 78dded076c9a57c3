import { C_0 } from '../constants';

/**
 * Resonant frequency of a lossless LC circuit, f = 1 / (2π√(LC)), in Hz (Thomson's formula).
 * Domain: L > 0, C > 0. @example resonantFrequencyLC(0.0177, 20e-12) // ≈ 2.675e5
 */
export function resonantFrequencyLC(L: number, C: number): number {
  if (!(L > 0) || !(C > 0)) throw new RangeError('resonantFrequencyLC needs L > 0 and C > 0');
  return 1 / (2 * Math.PI * Math.sqrt(L * C));
}

/**
 * Frequency whose quarter wavelength in free space equals the wire length, c / (4ℓ), in Hz.
 *
 * A comparison figure only: a wound secondary does not resonate at its wire's quarter-wave
 * frequency (the winding is a slow-wave structure; common practice notes the mismatch).
 * Domain: wireLength > 0. @example quarterWaveFrequency(300) // ≈ 249827
 */
export function quarterWaveFrequency(wireLength: number): number {
  if (!(wireLength > 0)) throw new RangeError('wire length must be positive');
  return C_0 / (4 * wireLength);
}

/**
 * Quality factor Q = 2πfL / R of a series inductor with loss resistance R at frequency f.
 * Domain: L > 0, R > 0, f > 0. @example qualityFactor(0.0177, 100, 250e3) // ≈ 278
 */
export function qualityFactor(L: number, R: number, f: number): number {
  if (!(L > 0) || !(R > 0) || !(f > 0)) throw new RangeError('qualityFactor needs L, R and f positive');
  return (2 * Math.PI * f * L) / R;
}
