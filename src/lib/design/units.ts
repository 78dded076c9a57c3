import { create, unitDependencies, type Unit } from 'mathjs';

// only the unit machinery: keeps the browser bundle small
const math = create({ unitDependencies });

export type QuantityKind = 'length' | 'capacitance' | 'inductance' | 'voltage' | 'current' | 'frequency' | 'angle';

interface KindInfo {
  /** what the quantity is called in messages */
  noun: string;
  siUnit: string;
  examples: string;
}

export const QUANTITY_KINDS: Record<QuantityKind, KindInfo> = {
  length: { noun: 'a length', siUnit: 'm', examples: '"4 in" or "0.1 m"' },
  capacitance: { noun: 'a capacitance', siUnit: 'F', examples: '"20 nF" or "4 pF"' },
  inductance: { noun: 'an inductance', siUnit: 'H', examples: '"50 uH" or "25 mH"' },
  voltage: { noun: 'a voltage', siUnit: 'V', examples: '"12 kV" or "340 V"' },
  current: { noun: 'a current', siUnit: 'A', examples: '"30 mA" or "1 A"' },
  frequency: { noun: 'a frequency', siUnit: 'Hz', examples: '"60 Hz" or "120 Hz"' },
  angle: { noun: 'an angle', siUnit: 'rad', examples: '"30 deg" or "0.5 rad"' },
};

// names for what a user may have typed by mistake, to say what was given instead
const DIMENSION_NAMES: Array<[string, string]> = [
  ['1 m', 'a length'],
  ['1 kg', 'a mass'],
  ['1 s', 'a time'],
  ['1 Hz', 'a frequency'],
  ['1 F', 'a capacitance'],
  ['1 H', 'an inductance'],
  ['1 V', 'a voltage'],
  ['1 A', 'a current'],
  ['1 ohm', 'a resistance'],
  ['1 W', 'a power'],
  ['1 J', 'an energy'],
  ['1 rad', 'an angle'],
  ['1 K', 'a temperature'],
  ['1 m^2', 'an area'],
  ['1 m^3', 'a volume'],
  ['1 m/s', 'a speed'],
  ['1 C', 'a charge'],
];

type MathUnit = Unit;
const unitOf = (text: string): MathUnit => math.unit(text) as MathUnit;
let references: Array<[MathUnit, string]> | null = null;
let kindUnits: Record<QuantityKind, MathUnit> | null = null;

function refs() {
  references ??= DIMENSION_NAMES.map(([u, name]): [MathUnit, string] => [unitOf(u), name]);
  kindUnits ??= Object.fromEntries(
    (Object.keys(QUANTITY_KINDS) as QuantityKind[]).map((k) => [k, unitOf(`1 ${QUANTITY_KINDS[k].siUnit}`)]),
  ) as unknown as Record<QuantityKind, MathUnit>;
  return { references: references!, kindUnits: kindUnits! };
}

function describeDimension(u: MathUnit): string {
  const hit = refs().references!.find(([r]) => u.equalBase(r));
  return hit ? hit[1] : `a quantity in ${u.formatUnits()}`;
}

export type QuantityParse = { ok: true; value: number } | { ok: false; message: string };

/** Normalises what people type: µ/μ for micro, Ω for ohm, a comma decimal point, stray spaces. */
function normalise(text: string): string {
  return text.trim().replace(/[µμ]/g, 'u').replace(/Ω/g, 'ohm').replace(/^(-?\d+),(\d+)/, '$1.$2').replace(/\s+/g, ' ');
}

/**
 * Reads a quantity given as a number in SI base units or as a string with a unit ("4.5 in", "20 nF",
 * "30 deg"), and returns its value in SI base units (radians for angles).
 */
export function parseQuantity(input: number | string, kind: QuantityKind): QuantityParse {
  const info = QUANTITY_KINDS[kind];
  const expected = `expected ${info.noun} such as ${info.examples}`;
  if (typeof input === 'number') {
    return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, message: `${expected}, got a number that is not finite` };
  }
  const text = normalise(input);
  if (text === '') return { ok: false, message: `${expected}, got an empty text` };
  if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text)) {
    return { ok: false, message: `${expected}, got a number without a unit (write "${text} ${info.siUnit}" or give a plain number in ${info.siUnit})` };
  }
  let u: MathUnit;
  try {
    u = unitOf(text);
  } catch {
    return { ok: false, message: `${expected}, got "${input}", which is not a number with a known unit` };
  }
  if (u.value === null || u.value === undefined) {
    return { ok: false, message: `${expected}, got the unit "${input}" without a number` };
  }
  if (!u.equalBase(refs().kindUnits[kind])) {
    return { ok: false, message: `${expected}, got ${describeDimension(u)}` };
  }
  const value = u.toNumber(info.siUnit);
  if (!Number.isFinite(value)) return { ok: false, message: `${expected}, got a value that is not finite` };
  return { ok: true, value };
}
