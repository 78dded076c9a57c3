import { parseDesign } from '../../lib/design';
import { solve } from '../../solver';
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
