/**
 * The one reader of quantities as people type them ("4.5 in", "20 nF", "30 deg"). Plain forms (a number and
 * one known unit) are read here without the full unit library; anything else (expressions, rarer units,
 * wrong dimensions) goes to mathjs in `units-mathjs.ts`, which gives the same value for the plain forms.
 */
import { METRES_PER_FOOT, METRES_PER_INCH } from './length';
import { canonicalNumberText, readLeadingNumber, readNumberText } from './read-number';

export type QuantityKind = 'length' | 'capacitance' | 'inductance' | 'voltage' | 'current' | 'frequency' | 'angle' | 'time';

interface KindInfo {
  /** what the quantity is called in messages */
  noun: string;
  siUnit: string;
  examples: string;
  /** the unit put after a bare number in the message that asks for one */
  exampleUnit: string;
}

export const QUANTITY_KINDS: Record<QuantityKind, KindInfo> = {
  length: { noun: 'a length', siUnit: 'm', examples: '"4 in" or "0.1 m"', exampleUnit: 'mm' },
  capacitance: { noun: 'a capacitance', siUnit: 'F', examples: '"20 nF" or "4 pF"', exampleUnit: 'nF' },
  inductance: { noun: 'an inductance', siUnit: 'H', examples: '"50 uH" or "25 mH"', exampleUnit: 'uH' },
  voltage: { noun: 'a voltage', siUnit: 'V', examples: '"12 kV" or "340 V"', exampleUnit: 'kV' },
  current: { noun: 'a current', siUnit: 'A', examples: '"30 mA" or "1 A"', exampleUnit: 'mA' },
  frequency: { noun: 'a frequency', siUnit: 'Hz', examples: '"60 Hz" or "120 Hz"', exampleUnit: 'Hz' },
  angle: { noun: 'an angle', siUnit: 'rad', examples: '"30 deg" or "0.5 rad"', exampleUnit: 'deg' },
  time: { noun: 'a time', siUnit: 's', examples: '"150 us" or "2 ms"', exampleUnit: 'us' },
};

export type QuantityParse = { ok: true; value: number } | { ok: false; message: string };

export interface SimpleUnit {
  kind: QuantityKind;
  /** the unit's size in SI and its prefix's, kept apart so the product is formed as mathjs forms it */
  unitValue: number;
  prefixValue: number;
  /** the unit system a length unit belongs to */
  system?: 'metric' | 'imperial';
}

const PREFIX: Record<string, number> = { G: 1e9, M: 1e6, k: 1e3, '': 1, c: 1e-2, m: 1e-3, u: 1e-6, n: 1e-9, p: 1e-12 };

function prefixed(symbol: string, kind: QuantityKind, prefixes: string[]): Array<[string, SimpleUnit]> {
  return prefixes.map((p) => [`${p}${symbol}`, { kind, unitValue: 1, prefixValue: PREFIX[p] }]);
}

const metric = (name: string, prefix: string): [string, SimpleUnit] => [name, { kind: 'length', unitValue: 1, prefixValue: PREFIX[prefix], system: 'metric' }];
const imperial = (name: string, metres: number): [string, SimpleUnit] => [name, { kind: 'length', unitValue: metres, prefixValue: 1, system: 'imperial' }];

/** The units of the plain forms, spelled as mathjs spells them (case matters: "mHz" is not "MHz"). */
export const SIMPLE_UNITS: ReadonlyMap<string, SimpleUnit> = new Map<string, SimpleUnit>([
  metric('m', ''),
  metric('mm', 'm'),
  metric('cm', 'c'),
  metric('km', 'k'),
  metric('um', 'u'),
  metric('meter', ''),
  metric('meters', ''),
  imperial('in', METRES_PER_INCH),
  imperial('inch', METRES_PER_INCH),
  imperial('inches', METRES_PER_INCH),
  imperial('ft', METRES_PER_FOOT),
  imperial('foot', METRES_PER_FOOT),
  imperial('feet', METRES_PER_FOOT),
  ...prefixed('F', 'capacitance', ['', 'm', 'u', 'n', 'p']),
  ...prefixed('H', 'inductance', ['', 'm', 'u', 'n']),
  ...prefixed('V', 'voltage', ['M', 'k', '', 'm']),
  ...prefixed('A', 'current', ['k', '', 'm', 'u']),
  ...prefixed('Hz', 'frequency', ['G', 'M', 'k', '']),
  ...prefixed('s', 'time', ['', 'm', 'u', 'n']),
  ['rad', { kind: 'angle', unitValue: 1, prefixValue: 1 }],
  ['deg', { kind: 'angle', unitValue: Math.PI / 180, prefixValue: 1 }],
]);

const NUMBER = String.raw`-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?`;
const SIMPLE = new RegExp(String.raw`^(${NUMBER}) ?([A-Za-z]+)$`);

/**
 * Normalises what people type: µ/μ for micro, Ω for ohm, the leading number by the one number rule
 * (`read-number.ts`: grouping and a decimal comma), stray spaces.
 */
export function normaliseQuantityText(text: string): string {
  return canonicalNumberText(text.trim().replace(/[µμ]/g, 'u').replace(/Ω/g, 'ohm')).replace(/\s+/g, ' ');
}

/** A plain form ("12 mm", "4.5 in", "20 nF") read into SI with its unit; null for anything else. */
export function readSimpleQuantity(text: string): { value: number; unit: SimpleUnit } | null {
  const m = SIMPLE.exec(normaliseQuantityText(text));
  if (!m) return null;
  const unit = SIMPLE_UNITS.get(m[2]);
  if (!unit) return null;
  const value = Number(m[1]) * (unit.unitValue * unit.prefixValue);
  return Number.isFinite(value) ? { value, unit } : null;
}

/**
 * The checks that need no unit library: numbers, empty text, a number without its unit, and the plain forms.
 * Returns null when the text needs the full parser.
 */
export function parseQuantityQuick(input: number | string, kind: QuantityKind): QuantityParse | null {
  const info = QUANTITY_KINDS[kind];
  const expected = expectedText(kind);
  if (typeof input === 'number') {
    return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, message: `${expected}, got a number that is not finite` };
  }
  const lead = readLeadingNumber(input);
  if (lead && !lead.read.ok) return { ok: false, message: `${expected}; ${lead.read.message}` };
  const text = normaliseQuantityText(input);
  if (text === '') return { ok: false, message: `${expected}, got an empty text` };
  if (readNumberText(text)?.ok) {
    return { ok: false, message: `${expected}, got a number without a unit; a bare number is read in no unit, so write it with one, e.g. "${text} ${info.exampleUnit}"` };
  }
  const simple = readSimpleQuantity(text);
  if (simple && simple.unit.kind === kind) return { ok: true, value: simple.value };
  return null;
}

export function expectedText(kind: QuantityKind): string {
  const info = QUANTITY_KINDS[kind];
  return `expected ${info.noun} such as ${info.examples}`;
}

/** The size in SI of a unit of the plain forms ("mH", "µH", "in"); undefined for a unit it does not know. */
export function siFactor(unit: string): number | undefined {
  const u = SIMPLE_UNITS.get(unit.replace(/[µμ]/g, 'u'));
  return u ? u.unitValue * u.prefixValue : undefined;
}
