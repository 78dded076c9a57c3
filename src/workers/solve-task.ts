import { parseDesign } from '../lib/design/parse';
import { FullReaderNeeded, withFullReader } from '../lib/format/units-reader';
import { solve } from '../solver/solve';
import { SOLVER_FAILED_MESSAGE, type SolverResponse } from './protocol';

/** A thrown error as a reply the page can show with a way to try again. */
export function solverFailure(id: number, e: unknown): SolverResponse {
  return { id, ok: false, failed: true, issues: [], message: e instanceof Error && e.message ? e.message : SOLVER_FAILED_MESSAGE };
}

/**
 * Reads and solves one design: the request every keystroke sends, kept apart from the charts, sweeps and
 * goals so the worker starts with only this code. Throws `FullReaderNeeded` when a text needs mathjs and
 * it is not loaded yet.
 */
export function solveRequest(id: number, input: unknown, now: () => number = () => performance.now()): SolverResponse {
  const t0 = now();
  try {
    const parsed = parseDesign(input);
    if (!parsed.ok) return { id, ok: false, issues: parsed.issues };
    const result = solve(parsed.design);
    return { id, ok: true, reply: { type: 'solve', data: { design: parsed.design, result, ms: now() - t0 } } };
  } catch (e) {
    if (e instanceof FullReaderNeeded) throw e;
    return solverFailure(id, e);
  }
}

/** `solveRequest`, loading the full unit reader (mathjs) first when a text of the design needs it. */
export async function solveRequestLoading(id: number, input: unknown): Promise<SolverResponse> {
  try {
    return await withFullReader(() => solveRequest(id, input));
  } catch (e) {
    return solverFailure(id, e);
  }
}
