import { formatSignificant, MISSING } from './number';

/** The two ways lengths are shown; a user's preference. */
export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

import { METRES_PER_INCH } from '../../solver/constants';

export { METRES_PER_INCH };
/** Exact by definition: the international foot (1959), NIST SP 811 (2008) Appendix B.8. */
export const METRES_PER_FOOT = 0.3048;

export interface LengthParts {
  value: number;
  unit: 'mm' | 'm' | 'km' | 'in' | 'ft';
}

/**
 * Picks the unit a builder would use for a length: millimetres below a metre and metres above (metric);
 * inches below 10 ft and feet above, or feet always for long wire runs (imperial).
 */
export function lengthParts(m: number, system: UnitSystem, scale: 'part' | 'run' = 'part'): LengthParts {
  const abs = Math.abs(m);
  if (system === 'metric') {
    if (scale === 'run' && abs >= 1000) return { value: m / 1000, unit: 'km' };
    if (abs >= 1 || (scale === 'run' && abs >= 0.1)) return { value: m, unit: 'm' };
    return { value: m * 1000, unit: 'mm' };
  }
  const inches = m / METRES_PER_INCH;
  if (scale === 'run' || Math.abs(inches) >= 120) return { value: m / METRES_PER_FOOT, unit: 'ft' };
  return { value: inches, unit: 'in' };
}

/** "114.3 mm", "4.5 in", "236.4 m", "775.6 ft". */
export function formatLength(m: number | null | undefined, system: UnitSystem, digits = 4, scale: 'part' | 'run' = 'part'): string {
  if (m === null || m === undefined || !Number.isFinite(m)) return MISSING;
  const { value, unit } = lengthParts(m, system, scale);
  return `${formatSignificant(value, digits)} ${unit}`;
}

/** The same length in both systems, the other one in brackets, for a builder holding a ruler of either kind. */
export function formatLengthBoth(m: number | null | undefined, system: UnitSystem, digits = 4): string {
  if (m === null || m === undefined || !Number.isFinite(m)) return MISSING;
  const other: UnitSystem = system === 'metric' ? 'imperial' : 'metric';
  return `${formatLength(m, system, digits)} (${formatLength(m, other, digits)})`;
}

/**
 * A length as text an input field accepts and the schema parses back to the same value within
 * `digits` significant figures: "101.6 mm", "4 in". Whole millimetres or thousandths of an inch are
 * kept; no exponent notation.
 */
export function lengthInputText(m: number, system: UnitSystem, digits = 6): string {
  if (!Number.isFinite(m)) return '';
  if (system === 'metric') {
    const abs = Math.abs(m);
    if (abs >= 10) return `${trim(m, digits)} m`;
    return `${trim(m * 1000, digits)} mm`;
  }
  return `${trim(m / METRES_PER_INCH, digits)} in`;
}

function trim(x: number, digits: number): string {
  if (x === 0) return '0';
  const v = Number(x.toPrecision(digits));
  // avoid exponent notation in input fields: toFixed with enough decimals, then strip zeros
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(v))));
  return v.toFixed(Math.min(decimals, 12)).replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '');
}
