import { z } from 'zod';
import { QUANTITY_KINDS, type QuantityKind } from '../format/units';
import { parseQuantity } from '../format/units-reader';
import { readNumberText } from '../format/read-number';
import { designField, type Bounds, type PathOfKind } from './registry';

export type { Bounds };

/** A quantity as a user gives it: a number in SI base units or a string with a unit. */
export type QuantityInput = number | string;

const typeError = (noun: string, examples: string) => (iss: { input: unknown }) =>
  iss.input === undefined
    ? 'is required'
    : typeof iss.input === 'number'
      ? `expected ${noun} such as ${examples}, got a number that is not finite`
      : `expected ${noun} such as ${examples}, as text with a unit or a number in SI units`;

function rangeMessage(b: Bounds, given: string): string {
  return `must be ${b.label}, got ${given}`;
}

/**
 * A quantity field: accepts a number (SI) or a string with a unit, checks the dimension and the
 * bounds, and leaves the input as given (a saved design keeps "4 in" as "4 in").
 */
export function quantity(kind: QuantityKind, bounds: Bounds, description: string) {
  const info = QUANTITY_KINDS[kind];
  return z
    .union([z.number(), z.string()], { error: typeError(info.noun, info.examples) })
    .superRefine((v, ctx) => {
      const r = parseQuantity(v, kind);
      if (!r.ok) {
        ctx.addIssue({ code: 'custom', message: r.message });
        return;
      }
      if (!inBounds(r.value, bounds)) ctx.addIssue({ code: 'custom', message: rangeMessage(bounds, typeof v === 'number' ? `${v} ${info.siUnit}` : `"${v}"`) });
    })
    .describe(`${description} (${info.noun}: a number in ${info.siUnit} or text such as ${info.examples})`);
}

function inBounds(x: number, b: Bounds): boolean {
  const aboveMin = b.minInclusive ? x >= b.min : x > b.min;
  return aboveMin && x <= b.max;
}

/** A plain number field (counts, gauges, ratios), optionally whole. */
export function count(bounds: Bounds, description: string, integer: boolean) {
  return z
    .number({
      error: (iss) =>
        iss.input === undefined
          ? 'is required'
          : typeof iss.input === 'number'
            ? 'expected a finite number'
            : notANumber(iss.input, integer),
    })
    .superRefine((v, ctx) => {
      if (!Number.isFinite(v)) ctx.addIssue({ code: 'custom', message: 'expected a finite number' });
      else if (integer && !Number.isInteger(v)) ctx.addIssue({ code: 'custom', message: `expected a whole number, got ${v}` });
      else if (!inBounds(v, bounds)) ctx.addIssue({ code: 'custom', message: rangeMessage(bounds, String(v)) });
    })
    .describe(description);
}

/** Why a text is not the number a plain-number field takes: the number rule's refusal, or what was expected. */
function notANumber(input: unknown, integer: boolean): string {
  const expected = integer ? 'a whole number' : 'a number';
  if (typeof input !== 'string') return `expected ${expected}`;
  const r = readNumberText(input);
  if (r && !r.ok) return `expected ${expected}; ${r.message}`;
  if (r?.ok) return `expected ${expected}, got the text "${input}"`;
  return `expected ${expected}, got "${input.slice(0, 40)}"`;
}

/** Reads an already validated quantity into SI. */
export function si(v: QuantityInput, kind: QuantityKind): number {
  const r = parseQuantity(v, kind);
  if (!r.ok) throw new RangeError(r.message);
  return r.value;
}

type QuantityPath = PathOfKind<QuantityKind>;
type NumberPath = PathOfKind<'count' | 'ratio' | 'gauge'>;

/** The schema of a quantity field, from its registry entry (kind, bounds, description). */
export function quantityField(path: QuantityPath) {
  const f = designField(path);
  return quantity(f.kind as QuantityKind, f.bounds!, f.help);
}

/** The schema of a plain-number field (count, gauge, ratio), from its registry entry. */
export function numberField(path: NumberPath) {
  const f = designField(path);
  return count(f.bounds!, f.help, f.integer === true);
}
