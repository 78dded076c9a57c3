/** How a reference value was obtained. */
export type ReferenceKind = 'published-table' | 'closed-form' | 'library' | 'worked-example' | 'common-practice';

/**
 * One check of a solver function against a value from outside the project. Shared by the test suite
 * (which asserts every case) and the validation page (which lists them), so the two cannot drift.
 */
export type ReferenceCase = {
  /** Stable identifier, kebab-case. */
  id: string;
  /** What is being computed, in words, e.g. "Nagaoka coefficient". */
  quantity: string;
  /** Anchor of the section on the methods page that explains the method, e.g. 'secondary-inductance'. */
  method: string;
  /** Author, title, year, table or equation of the reference value, with provenance marks. */
  source: string;
  kind: ReferenceKind;
  /** Inputs as shown to a reader (numbers, or values with their unit); made by `defineCase`. */
  inputs: Record<string, string | number | boolean>;
  /** The same inputs as `compute` receives them (quantities in SI). */
  received: Readonly<Record<string, string | number | boolean>>;
  /** The reference value, in `unit`. */
  reference: number;
  unit: string;
  /** Relative tolerance within which the solver must agree. */
  tolerance: number;
  /** The solver's value, in `unit`, computed from `received` only. */
  compute: () => number;
};
