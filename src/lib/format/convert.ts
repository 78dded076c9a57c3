import { lengthInputText, type UnitSystem } from './length';
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
  const converted = lengthInputText(parsed.metres, system);
  remember(converted, text.trim());
  return converted;
}
