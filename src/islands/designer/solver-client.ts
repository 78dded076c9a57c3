import type { SolverRequest, SolverResponse } from '../../workers/protocol';

type Pending = { resolve: (r: SolverResponse) => void };

/**
 * Talks to the solver worker. One worker per page; requests carry an id so replies find their caller.
 * Without Worker support (old browsers, tests in Node) the same tasks run on the main thread.
 */
export class SolverClient {
  private worker: Worker | null = null;
  private next = 1;
  private pending = new Map<number, Pending>();

  constructor() {
    if (typeof Worker !== 'undefined') {
      this.worker = new Worker(new URL('../../workers/solver.worker.ts', import.meta.url), { type: 'module', name: 'coilwright-solver' });
      this.worker.onmessage = (e: MessageEvent<SolverResponse>) => {
        const p = this.pending.get(e.data.id);
        if (!p) return;
        this.pending.delete(e.data.id);
        p.resolve(e.data);
      };
    }
  }

  async request(request: SolverRequest): Promise<SolverResponse> {
    const id = this.next++;
    if (!this.worker) {
      const { runRequest } = await import('../../workers/solver-tasks');
      return runRequest(id, request);
    }
    return new Promise((resolve) => {
      this.pending.set(id, { resolve });
      this.worker!.postMessage({ id, request });
    });
  }

  dispose() {
    this.worker?.terminate();
    this.worker = null;
    this.pending.clear();
  }
}

let shared: SolverClient | null = null;

/** The page's solver; islands on one page share it. */
export function solverClient(): SolverClient {
  shared ??= new SolverClient();
  return shared;
}
