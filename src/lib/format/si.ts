import { formatSignificant, MISSING } from './number';

/** SI prefixes from pico to giga: the span a coil designer meets. */
const PREFIXES: ReadonlyArray<{ symbol: string; exponent: number }> = [
  { symbol: 'p', exponent: -12 },
  { symbol: 'n', exponent: -9 },
  { symbol: 'µ', exponent: -6 },
  { symbol: 'm', exponent: -3 },
  { symbol: '', exponent: 0 },
  { symbol: 'k', exponent: 3 },
  { symbol: 'M', exponent: 6 },
  { symbol: 'G', exponent: 9 },
];

export interface SiParts {
  /** the number in the prefixed unit */
  value: number;
  prefix: string;
}

/** Units that read wrong with a prefix: nobody writes "k turns" or "mkg". */
const UNPREFIXED = new Set(['', '1', 'turns', '%', 'kg']);
/** Lengths above a metre stay in metres: kilometres of wire read oddly to a builder. */
const METRE_PREFIXES = PREFIXES.filter((p) => p.exponent <= 0).map((p) => p.symbol);

/**
 * Chooses the SI prefix that puts the value, rounded to `digits` significant figures, between 1 and 1000
 * (the engineering convention), limited to `allowed` when given (e.g. capacitance in pF/nF/µF only).
 */
export function siParts(x: number, allowed?: readonly string[], digits = 4): SiParts {
  const choices = allowed ? PREFIXES.filter((p) => allowed.includes(p.symbol)) : PREFIXES;
  if (x === 0 || !Number.isFinite(x)) return { value: x, prefix: choices.find((p) => p.exponent === 0)?.symbol ?? choices[0].symbol };
  const e = Math.log10(Math.abs(x));
  let best = choices[0];
  for (const p of choices) if (e >= p.exponent - 1e-9) best = p;
  let value = x / 10 ** best.exponent;
  // rounding can carry 999.96 up to 1000: move to the next prefix when there is one
  const next = choices[choices.indexOf(best) + 1];
  if (next && Math.abs(Number(value.toPrecision(digits))) >= 1000) {
    best = next;
    value = x / 10 ** best.exponent;
  }
  return { value, prefix: best.symbol };
}

/**
 * "12.35 kHz", "9.87 mH", "3.3 pF": a value in an SI unit with the fitting prefix, to `digits` significant
 * figures. Counts, turns, percentages and kilograms take no prefix; metres take none above unity.
 */
export function formatSi(x: number | null | undefined, unit: string, digits = 4, allowed?: readonly string[]): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return MISSING;
  if (UNPREFIXED.has(unit)) return unit === '' || unit === '1' ? formatSignificant(x, digits) : `${formatSignificant(x, digits)} ${unit}`;
  const { value, prefix } = siParts(x, allowed ?? (unit === 'm' ? METRE_PREFIXES : undefined), digits);
  return `${formatSignificant(value, digits)} ${prefix}${unit}`;
}
