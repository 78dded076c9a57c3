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

/**
 * Chooses the SI prefix that puts the value between 1 and 1000 (the engineering convention), limited to
 * `allowed` when given (e.g. capacitance in pF/nF/µF only).
 */
export function siParts(x: number, allowed?: readonly string[]): SiParts {
  const choices = allowed ? PREFIXES.filter((p) => allowed.includes(p.symbol)) : PREFIXES;
  if (x === 0 || !Number.isFinite(x)) return { value: x, prefix: choices.find((p) => p.exponent === 0)?.symbol ?? choices[0].symbol };
  const e = Math.log10(Math.abs(x));
  let best = choices[0];
  for (const p of choices) if (e >= p.exponent - 1e-9) best = p;
  let value = x / 10 ** best.exponent;
  // rounding can carry 999.96 up to 1000: move to the next prefix when there is one
  const next = choices[choices.indexOf(best) + 1];
  if (next && Math.abs(Number(value.toPrecision(4))) >= 1000) {
    best = next;
    value = x / 10 ** best.exponent;
  }
  return { value, prefix: best.symbol };
}

/** "12.35 kHz", "9.87 mH", "3.3 pF": a value in an SI unit with the fitting prefix. */
export function formatSi(x: number | null | undefined, unit: string, digits = 4, allowed?: readonly string[]): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return MISSING;
  const { value, prefix } = siParts(x, allowed);
  return `${formatSignificant(value, digits)} ${prefix}${unit}`;
}
