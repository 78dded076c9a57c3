import { lengthInputText, METRES_PER_FOOT, METRES_PER_INCH, type UnitSystem } from './length';

// Lengths as builders type them, for display conversion only; the design schema remains the judge of
// what is valid. Kept free of the full unit parser so the page can show converted values without it.
const LENGTH_UNITS: Record<string, { metres: number; system: UnitSystem }> = {
  mm: { metres: 1e-3, system: 'metric' },
  cm: { metres: 1e-2, system: 'metric' },
  m: { metres: 1, system: 'metric' },
  km: { metres: 1e3, system: 'metric' },
  in: { metres: METRES_PER_INCH, system: 'imperial' },
  inch: { metres: METRES_PER_INCH, system: 'imperial' },
  inches: { metres: METRES_PER_INCH, system: 'imperial' },
  ft: { metres: METRES_PER_FOOT, system: 'imperial' },
  foot: { metres: METRES_PER_FOOT, system: 'imperial' },
  feet: { metres: METRES_PER_FOOT, system: 'imperial' },
};

const NUMBER = String.raw`[-+]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:e[-+]?\d+)?`;
const PATTERN = new RegExp(String.raw`^\s*(${NUMBER})\s*([a-z]+)\s*$`, 'i');

/** Reads "4.5 in", "114 mm" or "0,6 m" into metres; null for anything else. */
export function readLength(text: string): { metres: number; system: UnitSystem } | null {
  const m = PATTERN.exec(text);
  if (!m) return null;
  const unit = LENGTH_UNITS[m[2].toLowerCase()];
  if (!unit) return null;
  const value = Number(m[1].replace(',', '.'));
  if (!Number.isFinite(value)) return null;
  return { metres: value * unit.metres, system: unit.system };
}

/**
 * Rewrites a length as typed ("4 in", "0.6 m") in the other unit system ("101.6 mm", "23.622 in"),
 * keeping the same length to six significant figures. Text already in the target system, and text
 * that is not a plain length, comes back unchanged, so a half-typed value is never lost.
 */
export function convertLengthText(text: string, system: UnitSystem): string {
  const parsed = readLength(text);
  if (!parsed || parsed.system === system) return text;
  // switching back returns exactly what was typed, so toggling units never drifts a value
  const earlier = origins.get(text.trim());
  if (earlier && readLength(earlier)?.system === system) return earlier;
  const converted = lengthInputText(parsed.metres, system);
  origins.set(converted, text.trim());
  return converted;
}

const origins = new Map<string, string>();
