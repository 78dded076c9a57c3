/// <reference lib="webworker" />
import type { SolverMessage } from './protocol';
import { solveRequestLoading, solverFailure } from './solve-task';

// The solver runs here so that typing in the designer never waits for it.
const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = async (e: MessageEvent<SolverMessage>) => {
  try {
    const { id, request } = e.data;
    if (request.type === 'solve') {
      scope.postMessage(await solveRequestLoading(id, request.input));
      return;
    }
    // charts, sweeps and goals load their code on their first request
    const { runRequestLoading } = await import('./solver-tasks');
    scope.postMessage(await runRequestLoading(id, request));
  } catch (err) {
    // runRequest answers its own errors; this catches anything that escapes it (e.g. a reply that cannot be cloned)
    scope.postMessage(solverFailure(e.data.id, err));
  }
};
