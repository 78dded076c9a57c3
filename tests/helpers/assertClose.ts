/**
 * Asserts |got − expected| ≤ relTol·|expected| (absolute relTol when expected is 0) and, on failure,
 * throws a message that names the check and prints got, expected, the relative error and the tolerance.
 * `label` should carry the inputs, e.g. "inductanceSolenoidLorenz(N=1000, r=0.05, l=0.5)".
 */
export function assertClose(got: number, expected: number, relTol: number, label: string): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const err = Math.abs(got - expected) / scale;
  if (!Number.isFinite(got) || !(err <= relTol)) {
    throw new Error(
      `${label}: got ${got}, expected ${expected}, relative error ${err.toExponential(3)} > tolerance ${relTol}`,
    );
  }
}
