import { parseDesign, type DesignSI, type ParseDesignResult } from '../../lib/design';
import { solve, type Result } from '../../solver';
import { ApiError } from '../http';

/** Validates a design input and solves it; bad input becomes the contract's validation error. */
export function validateDesign(input: unknown) {
  const parsed = parseDesign(input);
  if (!parsed.ok) throw new ApiError('validation_failed', 'The design has invalid fields.', prefixIssues(parsed.issues, ''));
  return parsed;
}

export function solveInput(input: unknown) {
  const parsed = validateDesign(input);
  return { input: parsed.input, result: solve(parsed.design) };
}

/** Solves a stored design; a design saved before a schema change still answers, with its result null. */
export function solveStored(input: unknown) {
  const parsed = parseDesign(input);
  return parsed.ok ? solve(parsed.design) : null;
}

export function prefixIssues(issues: Array<{ path: string; message: string }>, prefix: string) {
  return issues.map((i) => ({ path: prefix ? (i.path ? `${prefix}.${i.path}` : prefix) : i.path, message: i.message }));
}

/** A stored design, parsed once; `result` is solved on first read and then kept. */
export type SolvedDesign = {
  id: string;
  /** The stored calibration column, as read. */
  calibration: unknown;
  parsed: ParseDesignResult;
  readonly result: Result | null;
};

/** Parses a stored design row; the solver runs at most once, when `result` is first read. */
export function solvedRow(row: { id: string; design: unknown; calibration: unknown }, solver: (d: DesignSI) => Result = solve): SolvedDesign {
  const parsed = parseDesign(row.design);
  let result: Result | null | undefined;
  return {
    id: row.id,
    calibration: row.calibration,
    parsed,
    get result() {
      if (result === undefined) result = parsed.ok ? solver(parsed.design) : null;
      return result;
    },
  };
}

/** The parsed design and its result; a saved design that no longer parses is the validation error naming its fields. */
export function requireSolved(d: SolvedDesign): { design: DesignSI; result: Result } {
  const { parsed, result } = d;
  if (!parsed.ok || !result) {
    throw new ApiError('validation_failed', 'The saved design has invalid fields; fix it in the designer first.', parsed.ok ? [] : prefixIssues(parsed.issues, 'design'));
  }
  return { design: parsed.design, result };
}
