import { memo, useId } from 'react';
import type { UnitSystem } from '~/lib/format';

type Props = { value: UnitSystem; onChange: (s: UnitSystem) => void; note?: string | null };

/** Metric or imperial for lengths; inputs accept either whatever is chosen. */
export const UnitSwitch = memo(function UnitSwitch({ value, onChange, note }: Props) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-3">
      <legend className="sr-only">Units for lengths</legend>
      <span className="text-sm font-medium" aria-hidden="true">
        Units
      </span>
      <div className="inline-flex overflow-hidden rounded-lg border border-rule">
        {(['metric', 'imperial'] as const).map((s) => (
          <label key={s} className="cursor-pointer px-3 py-1.5 text-sm has-[:checked]:bg-copper has-[:checked]:text-on-copper has-[:focus-visible]:outline has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-arc">
            <input type="radio" name={name} value={s} checked={value === s} onChange={() => onChange(s)} className="sr-only" />
            {s === 'metric' ? 'Metric (mm, m)' : 'Imperial (in, ft)'}
          </label>
        ))}
      </div>
      {note && <span className="text-xs text-ink-soft" role="status">{note}</span>}
    </fieldset>
  );
});
