import { createContext, useContext } from 'react';
import type { SolverWarning } from '~/solver';

export interface FieldFeedback {
  /** the message for a field: the form's own check first, then the live solver's */
  errorFor: (path: string) => string | undefined;
  warningsFor: (path: string) => SolverWarning[];
  readOnly: boolean;
}

export const FieldFeedbackContext = createContext<FieldFeedback>({ errorFor: () => undefined, warningsFor: () => [], readOnly: false });

export function useFieldFeedback(): FieldFeedback {
  return useContext(FieldFeedbackContext);
}

/** DOM id for a field path: stable, so labels, messages and tests can point at it. */
export function fieldId(path: string): string {
  return `f-${path.replace(/[^A-Za-z0-9]+/g, '-')}`;
}
