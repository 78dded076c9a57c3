import { useCallback, useLayoutEffect, useRef, useState } from 'react';
import { flushSync } from 'react-dom';
import type { DesignIssue, DesignSI, Result } from '~/solver';
import { solverClient } from './solver-client';

export type LiveState =
  | { status: 'idle' }
  | { status: 'ok'; design: DesignSI; result: Result; ms: number }
  | { status: 'invalid'; issues: DesignIssue[]; message?: string }
  /** the computation broke (not the input's fault): shown with a way to try again */
  | { status: 'failed'; message: string };

const QUIET_MS = 150;

/**
 * Solves the design in the worker as the builder types: at once after a pause, otherwise at most
 * every 150 ms with the latest input. A reply older than the one on screen is dropped, and the last
 * good result stays available while the design is invalid, so the panel never flickers to empty.
 * A failed computation ends "pending"; `retry` runs the same input again.
 */
export function useLiveSolve(
  input: unknown,
  key: string,
): { live: LiveState; last: { design: DesignSI; result: Result } | null; pending: boolean; retry: () => void } {
  const [live, setLive] = useState<LiveState>({ status: 'idle' });
  const [last, setLast] = useState<{ design: DesignSI; result: Result } | null>(null);
  const [attempt, setAttempt] = useState(0);
  // the request whose answer is on screen; "pending" is read from it in render, so a keystroke costs no extra render
  const [answered, setAnswered] = useState<string | null>(null);
  const asked = `${attempt}:${key}`;
  const pending = answered !== asked;
  const seq = useRef(0);
  const shown = useRef(0);
  const lastRun = useRef(-Infinity);
  const inputRef = useRef(input);
  useLayoutEffect(() => {
    inputRef.current = input;
  }, [input]);

  // a layout effect: the request leaves in the commit of the keystroke itself, not in a later task
  useLayoutEffect(() => {
    const mine = ++seq.current;
    const request = `${attempt}:${key}`;
    const run = async () => {
      lastRun.current = performance.now();
      const r = await solverClient().request({ type: 'solve', input: inputRef.current });
      if (mine < shown.current) return;
      shown.current = mine;
      // the answer is rendered in the task that brought it, not in one scheduled after it
      flushSync(() => {
        if (mine === seq.current) setAnswered(request);
        if (r.ok && r.reply.type === 'solve') {
          setLive({ status: 'ok', ...r.reply.data });
          setLast({ design: r.reply.data.design, result: r.reply.data.result });
        } else if (!r.ok && r.failed) setLive({ status: 'failed', message: r.message });
        else if (!r.ok) setLive({ status: 'invalid', issues: r.issues, message: r.message });
      });
    };
    const wait = lastRun.current + QUIET_MS - performance.now();
    // after a pause the request goes at once, in this effect; a burst of keys waits for the window to end
    if (wait <= 0) {
      void run();
      return;
    }
    const timer = setTimeout(run, wait);
    return () => clearTimeout(timer);
  }, [key, attempt]);

  const retry = useCallback(() => setAttempt((n) => n + 1), []);
  return { live, last, pending, retry };
}
