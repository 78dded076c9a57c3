import type { ReactNode } from 'react';
import { useFormContext, type FieldPath } from 'react-hook-form';
import type { FormValues } from './values';
import { fieldId, useFieldFeedback } from './field-context';
import { FieldWarnings } from './FieldWarnings';

type Props = {
  path: FieldPath<FormValues>;
  label: string;
  hint?: ReactNode;
  placeholder?: string;
  inputMode?: 'text' | 'decimal' | 'numeric';
  className?: string;
};

/** A labelled text input bound to the form, with its error and the solver's warnings about it underneath. */
export function Field({ path, label, hint, placeholder, inputMode = 'text', className }: Props) {
  const { register } = useFormContext<FormValues>();
  const { errorFor, readOnly } = useFieldFeedback();
  const id = fieldId(path);
  const error = errorFor(path);
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
        inputMode={inputMode}
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
