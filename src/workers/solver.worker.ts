/// <reference lib="webworker" />
import type { SolverMessage } from './protocol';
import { runRequest } from './solver-tasks';

// The solver runs here so that typing in the designer never waits for it.
const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = (e: MessageEvent<SolverMessage>) => {
  scope.postMessage(runRequest(e.data.id, e.data.request));
};
