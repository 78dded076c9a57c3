import { formatSi, formatSignificant } from '../format';
import type { ReferenceKind } from './cases';

const PREFIX_EXPONENT: Record<string, number> = { p: -12, n: -9, µ: -6, u: -6, m: -3, '': 0, k: 3, M: 6, G: 9 };
// longest first, so "Hz" is not read as a prefixed "z"
const BASE_UNITS = ['Hz', 'Ω', 'F', 'H', 'J', 'W', 'V', 'A', 's', 'm'];

/** Digits shown for reference and computed values: enough to see agreement to the 4th decimal of a table. */
export const VALUE_DIGITS = 7;

/**
 * A case's value in its unit ("31.10706 pF", "0.2546 mm") re-expressed with the SI prefix that suits
 * it; units outside SI ("in", "kg", dimensionless "1") keep their own form.
 */
export function formatCaseValue(x: number | null, unit: string, digits = VALUE_DIGITS): string {
  if (x === null || !Number.isFinite(x)) return '—';
  if (unit === '1' || unit === '') return formatSignificant(x, digits);
  for (const base of BASE_UNITS) {
    if (!unit.endsWith(base)) continue;
    const exponent = PREFIX_EXPONENT[unit.slice(0, unit.length - base.length)];
    if (exponent === undefined) continue;
    return formatSi(x * 10 ** exponent, base, digits);
  }
  return `${formatSignificant(x, digits)} ${unit}`;
}

/** Signed relative difference in per cent: "+0.0033 %", "−0.28 %", "0 %". */
export function formatDifference(relative: number | null): string {
  if (relative === null || !Number.isFinite(relative)) return '—';
  if (relative === 0) return '0 %';
  const text = formatSignificant(Math.abs(relative) * 100, 2);
  return `${relative > 0 ? '+' : '−'}${text} %`;
}

export function formatTolerance(relative: number): string {
  return `± ${formatSignificant(relative * 100, 2)} %`;
}

export const KIND_LABEL: Record<ReferenceKind, string> = {
  'published-table': 'published table',
  'closed-form': 'closed form',
  library: 'general-purpose library',
  'worked-example': 'worked example',
  'common-practice': 'common practice',
};
