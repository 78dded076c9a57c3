import { useId, type InputHTMLAttributes, type Ref } from 'react';

type Props = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  /** Message shown under the field; also marks the input invalid for assistive technology. */
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled input whose error and hint are tied to it with aria-describedby. */
export function TextField({ label, error, hint, ref, className, ...input }: Props) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="cw-label">
        {label}
      </label>
      <input
        id={id}
        ref={ref}
        className="cw-input"
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...input}
      />
      {hint && (
        <p id={hintId} className="cw-hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="cw-field-error">
          {error}
        </p>
      )}
    </div>
  );
}
