import { useFormContext, type FieldPath } from 'react-hook-form';
import type { FormValues } from './values';
import { fieldId, useFieldFeedback } from './field-context';

type Props = {
  path: FieldPath<FormValues>;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  className?: string;
};

export function SelectField({ path, label, options, className }: Props) {
  const { register } = useFormContext<FormValues>();
  const { errorFor, readOnly } = useFieldFeedback();
  const id = fieldId(path);
  const error = errorFor(path);
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
