/**
 * Normal-mode frequencies of two lossless resonant circuits tuned to the same f0 and coupled by k:
 * f_lo = f0/√(1+k), f_hi = f0/√(1−k).
 * Source: "Electronics" lecture notes, §2.7 "Coupled, resonant circuits", eqs. 2.99–2.123 (author not
 * identified; confirmed); P. Drude, Ann. Phys. 13 (1904) 512–561 (from memory); F. E. Terman, Radio
 * Engineers' Handbook, 1943 (from memory). Domain 0 ≤ k < 1. Example: f0 = 100 kHz, k = 0.2 → 91.29 kHz and 111.80 kHz.
 */
export function splitFrequencies(f0: number, k: number): { fLow: number; fHigh: number } {
  return { fLow: f0 / Math.sqrt(1 + k), fHigh: f0 / Math.sqrt(1 - k) };
}

/**
 * First null of the primary's envelope, t₁ = π/ω_B = 1/(2(f_hi − f_lo)), ≈ 1/(2 k f0) for small k.
 * Source: "Electronics" lecture notes §2.7, eqs. 2.99–2.123 (confirmed). Example: f0 = 100 kHz, k = 0.2 → 24.39 µs (≈ 4.9 half-cycles).
 */
export function transferTime(f0: number, k: number): number {
  const { fLow, fHigh } = splitFrequencies(f0, k);
  return 1 / (2 * (fHigh - fLow));
}
