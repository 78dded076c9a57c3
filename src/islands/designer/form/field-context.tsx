import { createContext, useContext, useRef, useSyncExternalStore } from 'react';
import type { SolverWarning } from '~/solver';

export interface FieldFeedback {
  /** the message for a field: the form's own check first, then the live solver's */
  errorFor: (path: string) => string | undefined;
  warningsFor: (path: string) => SolverWarning[];
  readOnly: boolean;
}

const NONE: FieldFeedback = { errorFor: () => undefined, warningsFor: () => [], readOnly: false };

/**
 * The form's messages as a store: the designer puts the latest feedback in, and each field reads only its own
 * messages, so a new result renders again only the fields whose messages changed.
 */
export class FieldFeedbackStore {
  private listeners = new Set<() => void>();
  constructor(public current: FieldFeedback = NONE) {}

  set(next: FieldFeedback): void {
    if (next === this.current) return;
    this.current = next;
    for (const l of [...this.listeners]) l();
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

export const FieldFeedbackContext = createContext<FieldFeedbackStore>(new FieldFeedbackStore());

/** What `select` reads from the feedback; the component renders again only when that changes (compared as JSON). */
export function useFeedbackValue<T>(select: (f: FieldFeedback) => T): T {
  const store = useContext(FieldFeedbackContext);
  const cache = useRef<{ key: string; value: T } | null>(null);
  const snapshot = () => {
    const value = select(store.current);
    const key = JSON.stringify(value) ?? 'undefined';
    if (cache.current && cache.current.key === key) return cache.current.value;
    cache.current = { key, value };
    return value;
  };
  return useSyncExternalStore(store.subscribe, snapshot, snapshot);
}

export function useFieldError(path: string): string | undefined {
  return useFeedbackValue((f) => f.errorFor(path));
}

export function useFieldWarnings(path: string): SolverWarning[] {
  return useFeedbackValue((f) => f.warningsFor(path));
}

export function useFieldReadOnly(): boolean {
  return useFeedbackValue((f) => f.readOnly);
}

/** DOM id for a field path: stable, so labels, messages and tests can point at it. */
export function fieldId(path: string): string {
  return `f-${path.replace(/[^A-Za-z0-9]+/g, '-')}`;
}
