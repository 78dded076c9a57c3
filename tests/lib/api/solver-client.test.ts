import { describe, expect, it } from 'vitest';
import { SolverClient } from '~/islands/designer/solver-client';
import { runRequest } from '~/workers/solver-tasks';
import { type SolverMessage, type SolverResponse } from '~/workers/protocol';

/** A stand-in for the browser's Worker: answers with the real solver tasks, or crashes when told to. */
class FakeWorker {
  onmessage: ((e: MessageEvent<SolverResponse>) => void) | null = null;
  onerror: ((e: Event) => void) | null = null;
  onmessageerror: ((e: Event) => void) | null = null;
  terminated = false;
  constructor(private readonly crash: boolean) {}
  postMessage(m: SolverMessage) {
    setTimeout(() => {
      if (this.crash) this.onerror?.(Object.assign(new Event('error'), { message: 'worker ran out of memory' }));
      else this.onmessage?.({ data: runRequest(m.id, m.request) } as MessageEvent<SolverResponse>);
    }, 0);
  }
  terminate() {
    this.terminated = true;
  }
}

describe('solver client failures', () => {
  it('answers a request with a failure when the worker crashes, then starts a fresh worker', async () => {
    const made: FakeWorker[] = [];
    const client = new SolverClient(() => {
      const w = new FakeWorker(made.length === 0);
      made.push(w);
      return w as unknown as Worker;
    });
    const first = await client.request({ type: 'solve', input: {} });
    expect(first).toMatchObject({ ok: false, failed: true, message: 'worker ran out of memory' });
    expect(made[0].terminated).toBe(true);

    const second = await client.request({ type: 'solve', input: {} });
    expect(made).toHaveLength(2);
    // a fresh worker answers: an empty design is refused for its fields, not as a crash
    expect(second.ok).toBe(false);
    expect(!second.ok && second.failed).toBeFalsy();
    expect(!second.ok && second.issues.length).toBeGreaterThan(0);
  });

  it('turns an error thrown while reading the input into a failure, not an endless wait', () => {
    const input = {
      get secondary(): never {
        throw new Error('input could not be read');
      },
    };
    const r = runRequest(7, { type: 'solve', input });
    expect(r).toEqual({ id: 7, ok: false, failed: true, issues: [], message: 'input could not be read' });
  });
});
