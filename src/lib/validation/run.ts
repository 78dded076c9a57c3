import type { ReferenceCase, ReferenceKind } from './cases';

/** One reference check as the validation page shows it: the case, computed now, and its verdict. */
export interface CheckRow {
  id: string;
  quantity: string;
  method: string;
  source: string;
  kind: ReferenceKind;
  inputs: Array<{ name: string; value: string }>;
  reference: number;
  unit: string;
  tolerance: number;
  value: number | null;
  /** (value − reference) / reference; null when the value could not be computed */
  relativeDifference: number | null;
  pass: boolean;
  /** why the solver gave no value, in words; never a stack trace */
  error: string | null;
}

const ran = new WeakMap<readonly ReferenceCase[], CheckRow[]>();

/**
 * Every case run once per process: the solver is deterministic, so the rows cannot change while the
 * deployed code stays the same, and a page that shows them need not spend seconds solving them again.
 */
export function checkRows(cases: readonly ReferenceCase[]): CheckRow[] {
  let rows = ran.get(cases);
  if (!rows) ran.set(cases, (rows = cases.map(runCheck)));
  return rows;
}

/** Runs one case through the solver and compares it with its reference value. */
export function runCheck(c: ReferenceCase): CheckRow {
  let value: number | null = null;
  let error: string | null = null;
  try {
    const v = c.compute();
    if (Number.isFinite(v)) value = v;
    else error = 'the solver returned no finite value';
  } catch (e) {
    error = e instanceof Error && e.message ? e.message : 'the solver could not compute this case';
  }
  const relativeDifference = value === null ? null : c.reference === 0 ? value : (value - c.reference) / Math.abs(c.reference);
  return {
    id: c.id,
    quantity: c.quantity,
    method: c.method,
    source: c.source,
    kind: c.kind,
    inputs: Object.entries(c.inputs).map(([name, v]) => ({ name, value: String(v) })),
    reference: c.reference,
    unit: c.unit,
    tolerance: c.tolerance,
    value,
    relativeDifference,
    pass: relativeDifference !== null && Math.abs(relativeDifference) <= c.tolerance,
    error,
  };
}

export interface CheckGroup {
  /** anchor of the group on /validation: the method note's id, or the case's method when it has no note */
  anchor: string;
  title: string;
  rows: CheckRow[];
}

/**
 * Groups rows by the quantity family their method note covers (the sections of /methods), in the
 * order of `notes`; a method without a note gets a group of its own at the end.
 */
export function groupByMethod(
  rows: CheckRow[],
  notes: ReadonlyArray<{ id: string; title: string }>,
  noteFor: (method: string) => { id: string; title: string } | undefined,
): CheckGroup[] {
  const groups = new Map<string, CheckGroup>();
  for (const n of notes) groups.set(n.id, { anchor: n.id, title: n.title, rows: [] });
  for (const r of rows) {
    const note = noteFor(r.method);
    const key = note?.id ?? r.method;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { anchor: key, title: r.method, rows: [] }));
    g.rows.push(r);
  }
  return [...groups.values()].filter((g) => g.rows.length > 0);
}
