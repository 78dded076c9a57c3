/// <reference lib="webworker" />
import type { SolverMessage } from './protocol';
import { runRequestLoading, solverFailure } from './solver-tasks';

// The solver runs here so that typing in the designer never waits for it.
const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = async (e: MessageEvent<SolverMessage>) => {
  try {
    scope.postMessage(await runRequestLoading(e.data.id, e.data.request));
  } catch (err) {
    // runRequest answers its own errors; this catches anything that escapes it (e.g. a reply that cannot be cloned)
    scope.postMessage(solverFailure(e.data.id, err));
  }
};
