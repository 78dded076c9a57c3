/** Display of SI numbers with a metric prefix, shared by the library pages, the review summary and the comparison. */

const prefixes: Array<[number, string]> = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
];

/** Units that read wrong with a prefix (nobody writes "k turns"). */
const unprefixed = new Set(['', 'turns', '%', 'kg', 'Ω']);

function significant(x: number, digits: number): string {
  if (x === 0) return '0';
  const s = Number(x.toPrecision(digits));
  return String(s);
}

/** `formatSI(312400, 'Hz')` → "312 kHz"; null, NaN and Infinity → "—". */
export function formatSI(value: number | null | undefined, unit: string, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (unprefixed.has(unit)) return `${significant(value, digits)}${unit ? ` ${unit}` : ''}`;
  const abs = Math.abs(value);
  if (abs === 0) return `0 ${unit}`;
  // Lengths above a metre stay in metres; kilometres of wire read oddly to a builder.
  const choices = unit === 'm' ? prefixes.filter(([f]) => f <= 1) : prefixes;
  const [factor, p] = choices.find(([f]) => abs >= f * 0.9995) ?? choices[choices.length - 1];
  return `${significant(value / factor, digits)} ${p}${unit}`;
}

export function formatTurns(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return `${Number(value.toFixed(2))} turns`;
}

export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return d.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
}
