import type { ReactNode } from 'react';
import { useFormContext, type FieldPath } from 'react-hook-form';
import { findDesignField, type FieldSpec } from '~/lib/design/registry';
import { lengthsInSystem, type UnitSystem } from '~/lib/format';
import { BARE_NUMBER_RULE, GROUPING_RULE } from '~/lib/design/registry';
import type { FormValues } from './values';
import { fieldId, useFieldError, useFieldReadOnly } from './field-context';
import { FieldWarnings } from './FieldWarnings';

type Props = {
  path: FieldPath<FormValues>;
  /** defaults to the design registry's label and hint for the path */
  label?: string;
  hint?: ReactNode;
  system?: UnitSystem;
  placeholder?: string;
  inputMode?: 'text' | 'decimal' | 'numeric';
  className?: string;
};

/** The form's hint for a registry field: its own, or for a length an example in the user's system. */
export function registryHint(f: FieldSpec | undefined, system: UnitSystem = 'metric'): string | undefined {
  if (!f) return undefined;
  const rule = f.kind === 'count' ? GROUPING_RULE : f.kind === 'choice' || f.kind === 'gauge' || f.kind === 'ratio' ? '' : BARE_NUMBER_RULE;
  const own = f.hint ? lengthsInSystem(f.hint, system) : f.example ? `A length with its unit, e.g. ${f.example[system]}` : undefined;
  if (!own) return rule ? rule.charAt(0).toUpperCase() + rule.slice(1) : undefined;
  return rule ? `${own}; ${rule}` : own;
}

/** A labelled text input bound to the form, with its error and the solver's warnings about it underneath. */
export function Field({ path, label: givenLabel, hint: givenHint, system, placeholder, inputMode, className }: Props) {
  const spec = findDesignField(path);
  const label = givenLabel ?? spec?.label ?? path;
  const hint = givenHint ?? registryHint(spec, system);
  const mode = inputMode ?? (spec?.kind === 'count' ? (spec.integer ? 'numeric' : 'decimal') : spec?.kind === 'ratio' ? 'decimal' : 'text');
  const { register } = useFormContext<FormValues>();
  const readOnly = useFieldReadOnly();
  const id = fieldId(path);
  const rawError = useFieldError(path);
  const error = rawError ? lengthsInSystem(rawError, system ?? 'metric') : rawError;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const warnId = `${id}-warn`;
  return (
    <div className={className}>
      <label htmlFor={id} className="cw-label text-sm">
        {label}
      </label>
      <input
        id={id}
        className="cw-input"
        autoComplete="off"
        spellCheck={false}
        inputMode={mode}
        placeholder={placeholder}
        readOnly={readOnly}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId, warnId].filter(Boolean).join(' ')}
        {...register(path)}
      />
      {hint && (
        <p id={hintId} className="cw-hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="cw-field-error" data-error-for={path}>
          {error}
        </p>
      )}
      <FieldWarnings id={warnId} path={path} />
    </div>
  );
}
