import { create, unitDependencies } from 'mathjs';
import type { ReferenceCase } from './types';

// only the unit machinery of mathjs
const math = create({ unitDependencies });

/** A physical input of a reference case: shown as `value unit`, handed to `compute` in SI (or in `as`). */
export type Quantity = { readonly kind: 'quantity'; readonly shown: string; readonly received: number };

/** What a case's `inputs` may hold: plain numbers, words and flags are shown and received as they are. */
export type CaseInput = number | string | boolean | Quantity;

/** The inputs as `compute` receives them: every quantity as a number. */
export type Received<I extends Record<string, CaseInput>> = { readonly [K in keyof I]: I[K] extends Quantity ? number : I[K] };

/** The unit as mathjs spells it: micro as "u", powers with "^", degrees Celsius as "degC". */
const mathUnit = (unit: string) => unit.replace(/µ/g, 'u').replace(/²/g, '^2').replace(/³/g, '^3').replace('°C', 'degC');

/**
 * `value` in `unit` (e.g. `q(6.35, 'mm')`): shown as "6.35 mm", received by `compute` as 0.00635 (SI).
 * `as` names another unit for `compute` (e.g. '°C' for a solver argument in degrees Celsius); `note` is
 * shown after the value in brackets. Unit '1' is a plain number.
 */
export function q(value: number, unit: string, options: { as?: string; note?: string } = {}): Quantity {
  const received = unit === '1' ? value : options.as ? math.unit(value, mathUnit(unit)).toNumber(mathUnit(options.as)) : math.unit(value, mathUnit(unit)).toSI().toNumber();
  const shown = `${value}${unit === '1' ? '' : ` ${unit}`}${options.note ? ` (${options.note})` : ''}`;
  return { kind: 'quantity', shown, received };
}

function isQuantity(v: CaseInput): v is Quantity {
  return typeof v === 'object' && v.kind === 'quantity';
}

/**
 * A reference case whose inputs are stated once: `compute` receives exactly the `inputs` shown on /validation
 * (quantities converted to SI), so what a reader sees is what the solver was given.
 */
export function defineCase<const I extends Record<string, CaseInput>>(
  c: Omit<ReferenceCase, 'inputs' | 'received' | 'compute'> & { inputs: I; compute: (inputs: Received<I>) => number },
): ReferenceCase {
  const entries = Object.entries(c.inputs);
  const shown = Object.fromEntries(entries.map(([k, v]) => [k, isQuantity(v) ? v.shown : v]));
  const received: Readonly<Record<string, string | number | boolean>> = Object.freeze(
    Object.fromEntries(entries.map(([k, v]) => [k, isQuantity(v) ? v.received : v])),
  );
  const { compute, ...rest } = c;
  return { ...rest, inputs: shown, received, compute: () => compute(received as Received<I>) };
}
