import { useEffect, useState } from 'react';

export type WakeState = 'unsupported' | 'on' | 'off';

/**
 * Keeps the screen on while `active` (Screen Wake Lock API, where the browser has it). The browser drops the lock
 * when the page is hidden, so it is asked for again each time the page is shown.
 */
export function useWakeLock(active: boolean): WakeState {
  const [state, setState] = useState<WakeState>('off');
  useEffect(() => {
    const wl = typeof navigator !== 'undefined' ? navigator.wakeLock : undefined;
    if (!wl) {
      setState('unsupported');
      return;
    }
    if (!active) return;
    let lock: WakeLockSentinel | null = null;
    let stopped = false;
    const acquire = async () => {
      if (document.visibilityState !== 'visible') return;
      try {
        lock = await wl.request('screen');
        if (stopped) await lock.release();
        else {
          setState('on');
          lock.addEventListener('release', () => setState('off'));
        }
      } catch {
        setState('off');
      }
    };
    const onVisible = () => void acquire();
    void acquire();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      stopped = true;
      document.removeEventListener('visibilitychange', onVisible);
      void lock?.release().catch(() => {});
    };
  }, [active]);
  return state;
}
