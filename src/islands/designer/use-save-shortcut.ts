import { useEffect, useRef } from 'react';

/** Ctrl+S or Cmd+S runs `save` instead of the browser's "save page". The latest `save` is always the one run. */
export function useSaveShortcut(save: () => void) {
  const latest = useRef(save);
  useEffect(() => {
    latest.current = save;
  }, [save]);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === 's') {
        e.preventDefault();
        latest.current();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
