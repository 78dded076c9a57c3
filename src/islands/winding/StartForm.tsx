import { useState, type FormEvent } from 'react';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { WINDING_FIELD_LABELS as L } from '~/lib/api/contracts';
import { useStartWinding } from '~/lib/api/queries/winding';
import type { WindingPlan } from '~/lib/winding';
import { FormMessage } from '~/components/ui/FormMessage';
import { TextField } from '~/components/ui/TextField';
import { durationText, metresText, mmText, typedNumber } from './format';

type Props = { designId: string; plan: WindingPlan; defaults: { rpm: number; startOffset: number; formLength: number } };

/** Winder speed, spool and form: what the live figures need before the first turn. */
export function StartForm({ designId, plan, defaults }: Props) {
  const start = useStartWinding(designId);
  const [rpm, setRpm] = useState(String(defaults.rpm));
  const [spool, setSpool] = useState('');
  const [offset, setOffset] = useState((defaults.startOffset * 1000).toFixed(1));
  const [form, setForm] = useState((defaults.formLength * 1000).toFixed(1));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);

  async function submit(e: FormEvent) {
    e.preventDefault();
    const values = { rpm: typedNumber(rpm), spoolLength: typedNumber(spool), startOffset: typedNumber(offset), formLength: typedNumber(form) };
    const local: Record<string, string> = {};
    if (values.rpm === null || Number.isNaN(values.rpm)) local.rpm = `${L.rpm}: type the speed in revolutions per minute.`;
    if (Number.isNaN(values.spoolLength)) local.spoolLength = `${L.spoolLength}: type a length in metres, or leave it empty.`;
    if (Number.isNaN(values.startOffset)) local.startOffset = `${L.startOffset}: type a length in millimetres.`;
    if (Number.isNaN(values.formLength)) local.formLength = `${L.formLength}: type a length in millimetres.`;
    setErrors(local);
    if (Object.keys(local).length) return;
    try {
      await start.mutateAsync({
        rpm: values.rpm!,
        spoolLength: values.spoolLength,
        startOffset: values.startOffset === null ? undefined : values.startOffset / 1000,
        formLength: values.formLength === null ? undefined : values.formLength / 1000,
        startedAt: new Date(Date.now()).toISOString(),
      });
      setError(null);
    } catch (err) {
      if (err instanceof ApiFailure) setErrors(err.byPath);
      setError(failureMessage(err));
    }
  }

  const rpmN = typedNumber(rpm);
  return (
    <form onSubmit={submit} className="cw-card space-y-4" aria-label="Start winding">
      <p className="text-base">
        {plan.turns} turns at a pitch of {mmText(plan.pitch).replace(' mm', '')} mm ({plan.pitchSource === 'insulated-diameter' ? 'close-wound: the insulated wire diameter' : 'the spacing the design’s winding length sets'}),{' '}
        {mmText(plan.windingLength)} of winding, {metresText(plan.wireLength)} of wire.
        {rpmN !== null && rpmN > 0 && <> At {rpmN} rpm: {durationText((plan.turns / rpmN) * 60)} of winding, without stops.</>}
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label={`${L.rpm} (rpm)`} inputMode="decimal" value={rpm} onChange={(e) => setRpm(e.target.value)} error={errors.rpm} className="text-xl" />
        <TextField label={`${L.spoolLength} (m)`} inputMode="decimal" value={spool} onChange={(e) => setSpool(e.target.value)} error={errors.spoolLength} hint="Leave empty if you do not know it." />
        <TextField label={`${L.startOffset} (mm)`} inputMode="decimal" value={offset} onChange={(e) => setOffset(e.target.value)} error={errors.startOffset} hint="Heights measured from the form end have this subtracted." />
        <TextField label={`${L.formLength} (mm)`} inputMode="decimal" value={form} onChange={(e) => setForm(e.target.value)} error={errors.formLength} />
      </div>
      <button type="submit" className="cw-btn cw-btn-primary min-h-12 w-full text-xl sm:w-auto" disabled={start.isPending}>
        Start winding
      </button>
      <FormMessage error={error} />
    </form>
  );
}
