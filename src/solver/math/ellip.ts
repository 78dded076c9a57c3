/**
 * Complete elliptic integrals of the first and second kind, computed together.
 *
 * Returns `{ K, E }` for parameter m = k² (the modulus squared, as in scipy's `ellipk(m)` and
 * @stdlib's `ellipk(m)`). Method: one arithmetic–geometric-mean loop, K = π / (2·AGM(1, √(1−m))) and
 * E = K·(1 − Σ 2^(n−1) c_n²) (M. Abramowitz & I. A. Stegun, "Handbook of Mathematical Functions",
 * 1964, §17.6, from memory), with c_n from the cancellation-free recurrence
 * c_(n+1) = c_n² / (4 a_(n+1)), c_0² = m. When 1 − m < 1e-12 the logarithmic asymptote is used
 * (A&S 17.3.26 and 17.3.36, from memory): K ≈ Λ + (m₁/4)(Λ − 1), E ≈ 1 + (m₁/2)(Λ − ½),
 * Λ = ln(4/√m₁), m₁ = 1 − m, whose truncation error is O(m₁² Λ) < 1e-22.
 *
 * Domain: m ≤ 1 (m < 0 is allowed). m = 1 gives K = Infinity, E = 1. m > 1 or NaN gives NaN for both.
 * Accuracy: agrees with @stdlib ellipk/ellipe to about 1e-15 relative (tests assert 1e-13).
 *
 * @example ellipKE(0.5) // { K: 1.8540746773013717, E: 1.3506438810476753 }
 */
export function ellipKE(m: number): { K: number; E: number } {
  if (!(m <= 1)) return { K: NaN, E: NaN };
  return fromAgm(m, 1 - m);
}

/**
 * The same pair as {@link ellipKE}, but taking the complementary parameter m₁ = 1 − m.
 *
 * Use it when 1 − m is available without cancellation, e.g. for two coaxial filaments that nearly
 * touch: 1 − m = ((a−b)² + d²)/((a+b)² + d²) keeps full relative accuracy there, while forming
 * m first and subtracting it from 1 would not.
 *
 * Domain: m₁ ≥ 0. @example ellipKEComplementary(1e-20).K // ≈ 24.412145291060348
 */
export function ellipKEComplementary(mc: number): { K: number; E: number } {
  if (!(mc >= 0)) return { K: NaN, E: NaN };
  return fromAgm(1 - mc, mc);
}

/**
 * K(m) − E(m) without the cancellation of subtracting two values near π/2 when m is small.
 *
 * From the same AGM loop: K − E = K·Σ 2^(n−1) c_n² (A&S 17.6.4, from memory), a sum of positive
 * terms for 0 < m < 1. Domain: 0 ≤ m ≤ 1. @example ellipKMinusE(1e-10) // ≈ 7.853981634e-11 (π m / 4)
 */
export function ellipKMinusE(m: number): number {
  if (!(m >= 0 && m <= 1)) return NaN;
  const mc = 1 - m;
  if (mc < 1e-12) {
    const { K, E } = fromAgm(m, mc);
    return K - E;
  }
  const { K, tail } = agm(m, mc);
  return K * (0.5 * m + tail);
}

function fromAgm(m: number, mc: number): { K: number; E: number } {
  if (mc === 0) return { K: Infinity, E: 1 };
  if (mc < 1e-12) {
    const lambda = Math.log(4) - 0.5 * Math.log(mc);
    return { K: lambda + 0.25 * mc * (lambda - 1), E: 1 + 0.5 * mc * (lambda - 0.5) };
  }
  const { K, tail } = agm(m, mc);
  return { K, E: K * (1 - 0.5 * m - tail) };
}

/** AGM of 1 and √m₁; `tail` is Σ_(n≥1) 2^(n−1) c_n², the full sum being m/2 + tail. */
function agm(m: number, mc: number): { K: number; tail: number } {
  let a = 1;
  let b = Math.sqrt(mc);
  let weight = 0.5;
  let cSq = m;
  let tail = 0;
  for (let n = 0; n < 60; n++) {
    const aNext = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = aNext;
    const c = cSq / (4 * a);
    cSq = c * c;
    weight *= 2;
    tail += weight * cSq;
    if (Math.abs(c) <= 1e-17 * a) break;
  }
  return { K: Math.PI / (2 * a), tail };
}

/**
 * K alone from the complementary parameter m₁ = 1 − m: the inner loop of kernels that need only K
 * (ring-charge potentials). Same method and accuracy as {@link ellipKEComplementary}.
 * Domain: m₁ ≥ 0. @example ellipKComplementary(0.5) // ≈ 1.854074677301372
 */
export function ellipKComplementary(mc: number): number {
  if (!(mc >= 0)) return NaN;
  if (mc === 0) return Infinity;
  if (mc < 1e-12) {
    const lambda = Math.log(4) - 0.5 * Math.log(mc);
    return lambda + 0.25 * mc * (lambda - 1);
  }
  let a = 1;
  let b = Math.sqrt(mc);
  for (let n = 0; n < 60; n++) {
    const aNext = 0.5 * (a + b);
    const diff = a - b;
    b = Math.sqrt(a * b);
    a = aNext;
    if (Math.abs(diff) <= 1e-8 * a) break;
  }
  return Math.PI / (2 * a);
}

/**
 * (1 − m/2)·K(m) − E(m), the combination in Maxwell's mutual inductance of coaxial circles, given
 * both m and m₁ = 1 − m so neither has to be formed by subtraction.
 *
 * From the AGM loop it equals K·Σ_(n≥1) 2^(n−1) c_n², a sum of positive terms, so it keeps full
 * relative accuracy for distant filaments where it behaves like π m²/32 and direct evaluation would
 * cancel. Domain: 0 ≤ m ≤ 1, m + m₁ = 1. @example ellipMaxwellCombination(1e-8, 1 - 1e-8) // ≈ 9.8175e-18
 */
export function ellipMaxwellCombination(m: number, mc: number): number {
  if (!(m >= 0) || !(mc >= 0)) return NaN;
  if (mc < 1e-12) {
    const { K, E } = fromAgm(m, mc);
    return (1 - 0.5 * m) * K - E;
  }
  const { K, tail } = agm(m, mc);
  return K * tail;
}
