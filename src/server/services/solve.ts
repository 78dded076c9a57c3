import { parseDesign, type DesignSI, type ParseDesignResult } from '../../lib/design';
import type { ApiIssue, DesignInput, Result, ResultSummary } from '../../lib/api/contracts';
import { solve } from '../../solver';
import { ApiError } from '../http';

/** Validates a design input; bad input becomes the contract's validation error, each issue under `prefix`. */
export function validateDesign(input: unknown, prefix = '') {
  const parsed = parseDesign(input);
  if (!parsed.ok) throw new ApiError('validation_failed', 'The design has invalid fields.', prefixIssues(parsed.issues, prefix));
  return parsed;
}

/** The `design` member of a request body: required, and checked with every issue named under "design.". */
export function requireDesignField(design: unknown) {
  if (design === undefined) throw new ApiError('validation_failed', 'Some fields need attention.', [{ path: 'design', message: 'The design is missing.' }]);
  return validateDesign(design, 'design');
}

export function solveInput(input: unknown): { input: DesignInput; result: Result } {
  const parsed = validateDesign(input);
  return { input: parsed.input, result: solve(parsed.design) };
}

/**
 * A stored design parsed and solved once per process. The solver is deterministic and a stored design is
 * saved once and read many times, so the 256 most recently read are kept, keyed by their JSON. Callers only
 * read or serialise what they get, never change it.
 */
type StoredSolution = { parsed: ParseDesignResult; readonly result: Result | null };

function storedSolution(input: unknown): StoredSolution {
  const key = JSON.stringify(input);
  const hit = storedResults.get(key);
  if (hit !== undefined) {
    storedResults.delete(key);
    storedResults.set(key, hit);
    return hit;
  }
  const parsed = parseDesign(input);
  let result: Result | null | undefined;
  // solved on first read: a page that shows no result (a history) does not solve at all
  const solution: StoredSolution = {
    parsed,
    get result() {
      if (result === undefined) result = parsed.ok ? solve(parsed.design) : null;
      return result;
    },
  };
  storedResults.set(key, solution);
  if (storedResults.size > 256) storedResults.delete(storedResults.keys().next().value as string);
  return solution;
}

const storedResults = new Map<string, StoredSolution>();

/** Solves a stored design; a design saved before a schema change still answers, with its result null. */
export function solveStored(input: unknown): Result | null {
  return storedSolution(input).result;
}

/** The key figures stored with each revision. */
export function resultSummary(result: Result | null): ResultSummary | null {
  if (!result) return null;
  return {
    loadedFrequency: result.system?.resonantFrequency ?? null,
    tapTurns: result.tuning?.tapTurns ?? null,
    k: result.coupling?.k ?? null,
    inductance: result.secondary?.inductance ?? null,
  };
}

export function prefixIssues(issues: ApiIssue[], prefix: string): ApiIssue[] {
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

/**
 * Parses a stored design row; the solver runs at most once, when `result` is first read. With the real solver
 * the parse and the result come from the process-wide memo of stored designs (the same design read again is
 * not solved again); a solver passed in (a test counting calls) is called afresh.
 */
export function solvedRow(row: { id: string; design: unknown; calibration: unknown }, solver?: (d: DesignSI) => Result): SolvedDesign {
  if (!solver) {
    const memo = storedSolution(row.design);
    return {
      id: row.id,
      calibration: row.calibration,
      parsed: memo.parsed,
      get result() {
        return memo.result;
      },
    };
  }
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
