import { useId, useState, type SubmitEvent } from 'react';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useUpdateMe } from '~/lib/api/queries/account';
import type { UnitSystem } from '~/lib/format';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';

type Props = { unitSystem: UnitSystem };

const choices: { value: UnitSystem; label: string; example: string }[] = [
  { value: 'metric', label: 'Metric', example: 'millimetres and metres, e.g. 114.3 mm' },
  { value: 'imperial', label: 'Imperial', example: 'inches and feet, e.g. 4.5 in' },
];

function UnitsForm({ unitSystem }: Props) {
  const [value, setValue] = useState<UnitSystem>(unitSystem);
  const update = useUpdateMe();
  const pending = update.isPending;
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const name = useId();

  async function onSubmit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    setFormError(null);
    setSaved(null);
    try {
      await update.mutateAsync({ unitSystem: value });
      setSaved(value === 'metric' ? 'Lengths will show in metric units.' : 'Lengths will show in imperial units.');
    } catch (err) {
      setFormError(failureMessage(err));
    }
  }

  return (
    <form method="post" onSubmit={onSubmit} className="space-y-4" aria-label="Units">
      <fieldset>
        <legend className="cw-label">Show lengths in</legend>
        <div className="mt-1 grid gap-2 sm:grid-cols-2">
          {choices.map((c) => (
            <label
              key={c.value}
              className="flex cursor-pointer items-start gap-3 rounded-lg border border-rule p-3 has-[:checked]:border-copper has-[:checked]:bg-paper"
            >
              <input
                type="radio"
                name={name}
                value={c.value}
                checked={value === c.value}
                onChange={() => setValue(c.value)}
                className="mt-1 h-4 w-4 accent-copper"
              />
              <span>
                <span className="block font-medium">{c.label}</span>
                <span className="block text-sm text-ink-soft">{c.example}</span>
              </span>
            </label>
          ))}
        </div>
        <p className="cw-hint">Inputs accept either system whatever you choose here; results are computed in SI units.</p>
      </fieldset>
      <FormMessage error={formError} success={saved} />
      <SubmitButton pending={pending} pendingLabel="Saving…">
        Save units
      </SubmitButton>
    </form>
  );
}

/** The display units of the signed-in person. */
export default withApi(UnitsForm);
