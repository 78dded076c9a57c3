import { create, unitDependencies, type Unit } from 'mathjs';
import { expectedText, normaliseQuantityText, parseQuantityQuick, QUANTITY_KINDS, type QuantityKind, type QuantityParse } from './units';
import { setFullReader } from './units-fallback';

// only the unit machinery of mathjs
const math = create({ unitDependencies });

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

const unitOf = (text: string): Unit => math.unit(text) as Unit;
let references: Array<[Unit, string]> | null = null;
let kindUnits: Record<QuantityKind, Unit> | null = null;

function refs() {
  references ??= DIMENSION_NAMES.map(([u, name]): [Unit, string] => [unitOf(u), name]);
  kindUnits ??= Object.fromEntries(
    (Object.keys(QUANTITY_KINDS) as QuantityKind[]).map((k) => [k, unitOf(`1 ${QUANTITY_KINDS[k].siUnit}`)]),
  ) as unknown as Record<QuantityKind, Unit>;
  return { references, kindUnits };
}

function describeDimension(u: Unit): string {
  const hit = refs().references.find(([r]) => u.equalBase(r));
  return hit ? hit[1] : `a quantity in ${u.formatUnits()}`;
}

/** The full reading of a text by mathjs, with no fast path: what the fast path is checked against. */
export function parseWithMathjs(input: string, kind: QuantityKind): QuantityParse {
  const info = QUANTITY_KINDS[kind];
  const expected = expectedText(kind);
  let u: Unit;
  try {
    u = unitOf(normaliseQuantityText(input));
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

/**
 * Reads a quantity given as a number in SI base units or as a string with a unit ("4.5 in", "20 nF",
 * "30 deg"), and returns its value in SI base units (radians for angles).
 */
export function parseQuantity(input: number | string, kind: QuantityKind): QuantityParse {
  return parseQuantityQuick(input, kind) ?? parseWithMathjs(input as string, kind);
}

// the schema's reader (`units-reader.ts`) hands every text the plain forms do not cover to this module
setFullReader(parseWithMathjs);
