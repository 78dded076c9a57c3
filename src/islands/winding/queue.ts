import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiFailure } from '~/lib/api/client';
import type { WindingReadingBody, WindingReadingResponse } from '~/lib/api/contracts';
import { sendWindingReading } from '~/lib/api/queries/winding';

export type QueuedReading = WindingReadingBody;
export type SendOutcome = { kind: 'stored' } | { kind: 'queued' } | { kind: 'refused'; failure: ApiFailure };

const storageKey = (sessionId: string) => `coilwright.winding.${sessionId}.readings`;

function load(sessionId: string): QueuedReading[] {
  try {
    const raw = globalThis.localStorage?.getItem(storageKey(sessionId));
    const list: unknown = raw ? JSON.parse(raw) : [];
    return Array.isArray(list) ? (list as QueuedReading[]) : [];
  } catch {
    return [];
  }
}

function save(sessionId: string, list: QueuedReading[]) {
  if (list.length) localStorage.setItem(storageKey(sessionId), JSON.stringify(list));
  else localStorage.removeItem(storageKey(sessionId));
}

/** A failure worth trying again later: no connection, or the server briefly unable to answer. */
const retryable = (e: unknown) => !(e instanceof ApiFailure) || e.offline || e.status >= 500 || e.status === 429;

/**
 * Readings are written to this device first and sent in order from there: a dropped connection keeps them
 * (in localStorage, so a reload keeps them too) until the `online` event, or the next try, sends them. Each
 * carries the id made when it was recorded, so one that reached the server before the connection dropped is
 * not stored twice.
 */
export function useReadingQueue(designId: string, sessionId: string, onStored: (r: WindingReadingResponse) => void) {
  const [pending, setPending] = useState<QueuedReading[]>([]);
  const chain = useRef<Promise<void>>(Promise.resolve());
  const outcomes = useRef(new Map<string, SendOutcome>());
  const stored = useRef(onStored);
  useEffect(() => {
    stored.current = onStored;
  }, [onStored]);

  const sendAll = useCallback(async () => {
    for (;;) {
      const [next] = load(sessionId);
      if (!next) break;
      try {
        stored.current(await sendWindingReading(designId, sessionId, next));
        outcomes.current.set(next.id, { kind: 'stored' });
      } catch (e) {
        if (retryable(e)) {
          outcomes.current.set(next.id, { kind: 'queued' });
          break;
        }
        // refused (a count going backwards, a height off the form): it would be refused again, so it leaves the queue
        outcomes.current.set(next.id, { kind: 'refused', failure: e as ApiFailure });
      }
      save(sessionId, load(sessionId).filter((x) => x.id !== next.id));
    }
    setPending(load(sessionId));
  }, [designId, sessionId]);

  const flush = useCallback(() => {
    chain.current = chain.current.then(sendAll, sendAll);
    return chain.current;
  }, [sendAll]);

  /** Keeps the reading on this device, then sends everything waiting, oldest first. */
  const record = useCallback(
    async (body: QueuedReading): Promise<SendOutcome> => {
      save(sessionId, [...load(sessionId), body]);
      setPending(load(sessionId));
      await flush();
      return outcomes.current.get(body.id) ?? { kind: 'queued' };
    },
    [flush, sessionId],
  );

  useEffect(() => {
    setPending(load(sessionId));
    void flush();
    const online = () => void flush();
    window.addEventListener('online', online);
    const retry = window.setInterval(online, 20_000);
    return () => {
      window.removeEventListener('online', online);
      window.clearInterval(retry);
    };
  }, [flush, sessionId]);

  return { pending, record, flush };
}
