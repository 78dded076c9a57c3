import type { ReactNode } from 'react';
import { useHydrated } from './useHydrated';

type Props = { pending: boolean; children: ReactNode; pendingLabel?: string; className?: string };

/**
 * Disabled until the island is live: a click before that would make the browser submit the form itself
 * and put what was typed into the address bar.
 */
export function SubmitButton({ pending, children, pendingLabel, className }: Props) {
  const hydrated = useHydrated();
  return (
    <button
      type="submit"
      className={`cw-btn cw-btn-primary ${className ?? ''}`}
      disabled={pending || !hydrated}
      aria-busy={pending || undefined}
    >
      {pending ? (pendingLabel ?? 'Working…') : children}
    </button>
  );
}
