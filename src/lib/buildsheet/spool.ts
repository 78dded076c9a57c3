/**
 * Spool sizes magnet wire is commonly sold in, by net copper weight (common practice: distributors list
 * these sizes; check your supplier).
 */
export const SPOOL_SIZES_KG = [0.25, 0.5, 1, 2, 5, 10] as const;
export const SPOOL_SIZES_LB = [0.5, 1, 2, 5, 10, 25] as const;
const LB = 0.45359237;

export interface SpoolSuggestion {
  /** spools of `size` to order */
  count: number;
  size: number;
  unit: 'kg' | 'lb';
  /** total copper ordered, kg */
  totalMass: number;
}

/**
 * Smallest common spool that holds `massNeeded` kg of copper, or several of the largest when none does.
 * One continuous length matters (a splice in a secondary is a weak point, common practice), so a
 * single spool is preferred over two smaller ones.
 */
export function suggestSpool(massNeeded: number, unit: 'kg' | 'lb'): SpoolSuggestion {
  const sizes = unit === 'kg' ? SPOOL_SIZES_KG : SPOOL_SIZES_LB;
  const toKg = unit === 'kg' ? 1 : LB;
  const fit = sizes.find((s) => s * toKg >= massNeeded);
  if (fit !== undefined) return { count: 1, size: fit, unit, totalMass: fit * toKg };
  const largest = sizes[sizes.length - 1];
  const count = Math.ceil(massNeeded / (largest * toKg));
  return { count, size: largest, unit, totalMass: count * largest * toKg };
}
