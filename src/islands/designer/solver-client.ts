import { SOLVER_FAILED_MESSAGE, type SolverRequest, type SolverResponse } from '../../workers/protocol';

type Pending = { resolve: (r: SolverResponse) => void };

type WorkerFactory = () => Worker;

const defaultWorker: WorkerFactory = () => new Worker(new URL('../../workers/solver.worker.ts', import.meta.url), { type: 'module', name: 'coilwright-solver' });

/**
 * Talks to the solver worker. One worker per page; requests carry an id so replies find their caller.
 * If the worker crashes, every waiting request is answered with a failure (never left hanging) and the
 * next request starts a fresh worker. Without Worker support (old browsers, tests in Node) the same tasks
 * run on the main thread.
 */
export class SolverClient {
  private worker: Worker | null = null;
  private next = 1;
  private pending = new Map<number, Pending>();
  private readonly makeWorker: WorkerFactory | null;

  constructor(makeWorker: WorkerFactory | null = typeof Worker !== 'undefined' ? defaultWorker : null) {
    this.makeWorker = makeWorker;
  }

  private ensureWorker(): Worker | null {
    if (this.worker || !this.makeWorker) return this.worker;
    const w = this.makeWorker();
    w.onmessage = (e: MessageEvent<SolverResponse>) => {
      const p = this.pending.get(e.data.id);
      if (!p) return;
      this.pending.delete(e.data.id);
      p.resolve(e.data);
    };
    const crash = (e: Event) => {
      e.preventDefault?.();
      const text = (e as { message?: unknown }).message;
      this.failAll(typeof text === 'string' && text ? text : SOLVER_FAILED_MESSAGE);
    };
    w.onerror = crash;
    w.onmessageerror = crash;
    this.worker = w;
    return w;
  }

  /** The worker is gone: answer everyone waiting, and start afresh on the next request. */
  private failAll(message: string) {
    this.worker?.terminate();
    this.worker = null;
    const waiting = [...this.pending.entries()];
    this.pending.clear();
    for (const [id, p] of waiting) p.resolve({ id, ok: false, failed: true, issues: [], message });
  }

  async request(request: SolverRequest): Promise<SolverResponse> {
    const id = this.next++;
    const worker = this.ensureWorker();
    if (!worker) {
      const { runRequestLoading } = await import('../../workers/solver-tasks');
      return runRequestLoading(id, request);
    }
    return new Promise((resolve) => {
      this.pending.set(id, { resolve });
      try {
        worker.postMessage({ id, request });
      } catch (e) {
        this.pending.delete(id);
        resolve({ id, ok: false, failed: true, issues: [], message: e instanceof Error && e.message ? e.message : SOLVER_FAILED_MESSAGE });
      }
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
