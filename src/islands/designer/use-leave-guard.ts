import { useCallback, useEffect, useRef } from 'react';

/**
 * Asks before leaving the page while there are unsaved changes. `allow()` lifts the guard for a
 * navigation the page starts itself (e.g. to the design just created).
 */
export function useLeaveGuard(dirty: boolean): { allow: () => void } {
  const dirtyRef = useRef(dirty);
  const allowed = useRef(false);
  useEffect(() => {
    dirtyRef.current = dirty;
  }, [dirty]);
  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (!dirtyRef.current || allowed.current) return;
      e.preventDefault();
      // older browsers show the prompt only when returnValue is set
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, []);
  const allow = useCallback(() => void (allowed.current = true), []);
  return { allow };
}
