import { formatLength, lengthInputText, METRES_PER_INCH, type UnitSystem } from './length';
import { readLeadingNumber } from './read-number';
import { readSimpleQuantity } from './units';

/** Reads "4.5 in", "114 mm" or "0,6 m" into metres with the unit system it was written in; null for anything else. */
export function readLength(text: string): { metres: number; system: UnitSystem } | null {
  const q = readSimpleQuantity(text);
  if (!q || q.unit.kind !== 'length' || !q.unit.system) return null;
  return { metres: q.value, system: q.unit.system };
}

// what each converted text was converted from, so that switching back returns exactly what was typed;
// bounded, because a long session converts many texts
const ORIGINS_KEPT = 500;
const origins = new Map<string, string>();

function remember(converted: string, typed: string): void {
  origins.delete(converted);
  origins.set(converted, typed);
  if (origins.size > ORIGINS_KEPT) origins.delete(origins.keys().next().value as string);
}

/**
 * Rewrites a length as typed ("4 in", "0.6 m") in the other unit system ("101.6 mm", "23.622 in"),
 * keeping the same length to six significant figures. Text already in the target system, and text
 * that is not a plain length, comes back unchanged, so a half-typed value is never lost.
 */
export function convertLengthText(text: string, system: UnitSystem): string {
  const parsed = readLength(text);
  if (!parsed || parsed.system === system) return text;
  const earlier = origins.get(text.trim());
  if (earlier && readLength(earlier)?.system === system) return earlier;
  const converted = roundedLengthText(parsed.metres, system, enteredStep(text));
  remember(converted, text.trim());
  return converted;
}

/** Smallest steps a builder marks out: 1/16 in, and 0.1 mm. */
export const BUILDER_STEP = { imperial: METRES_PER_INCH / 16, metric: 0.1e-3 } as const;

/** The precision a length was typed with, in metres: "114.3 mm" → 0.1 mm, "4 in" → 1 in, "0.6 m" → 0.1 m. */
function enteredStep(text: string): number {
  const q = readLength(text);
  const lead = readLeadingNumber(text);
  if (!q || !lead || !lead.read.ok) return BUILDER_STEP.metric;
  const digits = lead.read.text.split('.')[1]?.length ?? 0;
  const number = Math.abs(lead.read.value);
  const perUnit = number === 0 ? 1 : Math.abs(q.metres) / number;
  return 10 ** -digits * perUnit;
}

/**
 * A length written in `system` to the precision it was entered with, never coarser than a builder's step
 * (1/16 in, 0.1 mm): "100 mm" → "3.94 in" (not "3.93701 in"), "0.6 m" → "23.62 in", "4.5 in" → "114.3 mm",
 * "0.25 in" → "6.35 mm" (one digit more in millimetres, so inch sizes keep their usual metric values).
 */
export function roundedLengthText(metres: number, system: UnitSystem, step: number): string {
  if (system === 'imperial') {
    const inches = Math.min(step, BUILDER_STEP.imperial) / METRES_PER_INCH;
    const decimals = Math.max(0, Math.ceil(-Math.log10(inches) - 1e-9));
    return `${trimFixed(metres / METRES_PER_INCH, decimals)} in`;
  }
  const mm = Math.min(step, BUILDER_STEP.metric) * 1000;
  const decimals = Math.max(0, Math.ceil(-Math.log10(mm) - 1e-9) + 1);
  if (Math.abs(metres) >= 10) return lengthInputText(metres, 'metric');
  return `${trimFixed(metres * 1000, decimals)} mm`;
}

function trimFixed(x: number, decimals: number): string {
  const s = x.toFixed(Math.min(decimals, 10));
  return (s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s).replace(/^-0$/, '0');
}

const METRIC_LENGTH_IN_TEXT = /(−|-)?(\d+(?:[.,]\d+)?)\s?(mm|cm|m)(?![A-Za-z²³])/g;
const METRIC_FACTOR: Record<string, number> = { mm: 1e-3, cm: 1e-2, m: 1 };

/**
 * A message or hint with its metric lengths said in the builder's unit system ("must be between 5 mm and
 * 10 m" → "must be between 0.197 in and 32.8 ft" in imperial); unchanged in metric.
 */
export function lengthsInSystem(text: string, system: UnitSystem): string {
  if (system === 'metric') return text;
  return text.replace(METRIC_LENGTH_IN_TEXT, (_all, minus: string | undefined, n: string, unit: string) => {
    const metres = Number(n.replace(',', '.')) * METRIC_FACTOR[unit] * (minus ? -1 : 1);
    return formatLength(metres, 'imperial', 3).replace(/^-/, '−');
  });
}
