import { useFormContext, type FieldPath } from 'react-hook-form';
import { findDesignField } from '~/lib/design/registry';
import type { FormValues } from './values';
import { fieldId, useFieldError, useFieldReadOnly } from './field-context';

type Props = {
  path: FieldPath<FormValues>;
  /** label and options default to the design registry's for the path */
  label?: string;
  options?: ReadonlyArray<{ value: string; label: string }>;
  /** the wording of a first "none" choice, for a part that may be absent */
  none?: string;
  className?: string;
};

export function SelectField({ path, label: givenLabel, options: givenOptions, none, className }: Props) {
  const spec = findDesignField(path);
  const label = givenLabel ?? spec?.label ?? path;
  const options = [...(none ? [{ value: 'none', label: none }] : []), ...(givenOptions ?? spec?.options ?? [])];
  const { register } = useFormContext<FormValues>();
  const readOnly = useFieldReadOnly();
  const id = fieldId(path);
  const error = useFieldError(path);
  return (
    <div className={className}>
      <label htmlFor={id} className="cw-label text-sm">
        {label}
      </label>
      <select id={id} className="cw-input" disabled={readOnly} aria-invalid={error ? true : undefined} {...register(path)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error && <p className="cw-field-error">{error}</p>}
    </div>
  );
}
