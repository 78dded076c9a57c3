import { useState, type FormEvent } from 'react';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { WINDING_FIELD_LABELS as L } from '~/lib/api/contracts';
import { usePutWindingChecklist, type WindingSession } from '~/lib/api/queries/winding';
import { COATING_ADVICE, FINISH_STEPS, SOLVENT_CAUTIONS } from '~/lib/winding';
import { FormMessage } from '~/components/ui/FormMessage';
import { TextField } from '~/components/ui/TextField';
import { typedNumber } from './format';

/** After the last turn: ends fastened, coats and drying time, with the solvent cautions beside them. */
export function Checklist({ designId, session, canWrite }: { designId: string; session: WindingSession; canWrite: boolean }) {
  const c = session.checklist;
  const put = usePutWindingChecklist(designId, session.id);
  const [base, setBase] = useState(c.baseEndFastened);
  const [top, setTop] = useState(c.topEndFastened);
  const [coating, setCoating] = useState(c.coating ?? '');
  const [coats, setCoats] = useState(c.coats === null ? '' : String(c.coats));
  const [drying, setDrying] = useState(c.dryingHours === null ? '' : String(c.dryingHours));
  const [notes, setNotes] = useState(c.notes ?? '');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ error?: string; success?: string }>({});

  async function submit(e: FormEvent) {
    e.preventDefault();
    const coatsN = typedNumber(coats);
    const dryingN = typedNumber(drying);
    const local: Record<string, string> = {};
    if (Number.isNaN(coatsN)) local.coats = `${L.coats}: type a whole number.`;
    if (Number.isNaN(dryingN)) local.dryingHours = `${L.dryingHours}: type a number of hours.`;
    setErrors(local);
    if (Object.keys(local).length) return;
    try {
      await put.mutateAsync({ baseEndFastened: base, topEndFastened: top, coating: coating.trim() || null, coats: coatsN, dryingHours: dryingN, notes: notes.trim() || null });
      setMessage({ success: 'Checklist saved.' });
    } catch (err) {
      if (err instanceof ApiFailure) setErrors(err.byPath);
      setMessage({ error: failureMessage(err) });
    }
  }

  return (
    <form onSubmit={submit} className="mt-4 space-y-3" aria-label="Finishing checklist" data-testid="checklist">
      <h4 className="text-lg">Finishing checklist</h4>
      {(['baseEndFastened', 'topEndFastened'] as const).map((k) => (
        <label key={k} className="flex min-h-12 items-center gap-3 text-base">
          <input
            type="checkbox"
            className="h-7 w-7"
            checked={k === 'baseEndFastened' ? base : top}
            disabled={!canWrite}
            onChange={(e) => (k === 'baseEndFastened' ? setBase(e.target.checked) : setTop(e.target.checked))}
          />
          {FINISH_STEPS[k]}
        </label>
      ))}
      <p className="max-w-3xl text-sm text-ink-soft">{COATING_ADVICE}</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Coating" value={coating} onChange={(e) => setCoating(e.target.value)} disabled={!canWrite} error={errors.coating} placeholder="oil-based polyurethane" />
        <TextField label={L.coats} inputMode="numeric" value={coats} onChange={(e) => setCoats(e.target.value)} disabled={!canWrite} error={errors.coats} />
        <TextField label={`${L.dryingHours} (h)`} inputMode="decimal" value={drying} onChange={(e) => setDrying(e.target.value)} disabled={!canWrite} error={errors.dryingHours} />
      </div>
      <aside className="rounded-lg border border-l-4 border-caution-edge bg-caution-bg p-3 text-sm text-caution-ink" data-safety="solvents" aria-label="Solvents and ventilation">
        <p className="font-semibold">Solvents and ventilation.</p>
        <ul className="mt-1 list-disc pl-5">
          {SOLVENT_CAUTIONS.map((t) => (
            <li key={t}>{t}</li>
          ))}
        </ul>
        <p className="mt-1">Common practice and the product label; local rules on solvents and fire come first.</p>
      </aside>
      <TextField label="Notes" value={notes} onChange={(e) => setNotes(e.target.value)} disabled={!canWrite} error={errors.notes} />
      {canWrite && (
        <button type="submit" className="cw-btn cw-btn-primary min-h-12 text-lg" disabled={put.isPending}>
          Save checklist
        </button>
      )}
      <FormMessage error={message.error} success={message.success} />
    </form>
  );
}
