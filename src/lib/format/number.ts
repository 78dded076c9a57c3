/**
 * Plain-number formatting for display. Values arrive in SI base units; these helpers only choose how
 * many digits to show. Never returns "NaN" or "Infinity": a missing or non-finite value becomes "—".
 */

export const MISSING = '—';

/** Rounds to `digits` significant figures and drops trailing zeros (1234.5 → "1235", 0.012300 → "0.0123"). */
export function formatSignificant(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return MISSING;
  if (x === 0) return '0';
  const rounded = Number(x.toPrecision(digits));
  const abs = Math.abs(rounded);
  if (abs >= 1e15 || abs < 1e-6) return rounded.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, 'e');
  // toPrecision may use exponent notation for large values; Number() + toString() prints plain digits
  return String(rounded);
}

/** Fixed decimals, with the minus sign of negative zero removed. */
export function formatFixed(x: number, decimals: number): string {
  if (!Number.isFinite(x)) return MISSING;
  const s = x.toFixed(decimals);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** Percent with one decimal: 0.1534 → "15.3 %". */
export function formatPercent(ratio: number, decimals = 1): string {
  if (!Number.isFinite(ratio)) return MISSING;
  return `${formatFixed(ratio * 100, decimals)} %`;
}

/** Turns to two decimals at most: 12.5 → "12.5 turns". */
export function formatTurns(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return MISSING;
  return `${Number(x.toFixed(2))} turns`;
}
