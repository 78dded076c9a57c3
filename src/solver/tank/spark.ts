import { METRES_PER_INCH } from '../constants';

/**
 * Freau's rule of thumb for the spark length of a spark-gap coil: L[in] ≈ 1.7 · √(input watts).
 * Source: J. Freau, Tesla Coil Mailing List, 1998 (pupman.com archive; single source), fitted to two of his coils; common practice and rough.
 * It does not apply to solid-state coils. Returns metres. Example: 1000 W → 53.8 in = 1.366 m.
 */
export function sparkLengthFreau(inputPower: number): number {
  return 1.7 * Math.sqrt(inputPower) * METRES_PER_INCH;
}

export const SPARK_LENGTH_NOTE =
  "Rough estimate from Freau's rule of thumb (1.7 × √watts inches; common practice, spark-gap coils only). " +
  'Keep people well beyond the longest arc: one performing troupe keeps at least 10 ft beyond it.';
