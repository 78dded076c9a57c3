import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { measurementBodySchema, measurementKindSchema, type CalibrationBody, type MeasurementBody } from '~/lib/api/contracts';
import { withApi } from '~/lib/api/provider';
import { useCreateMeasurement, useDeleteMeasurement, useMeasurements, usePutCalibration, type CalibrationView, type MeasurementRow } from '~/lib/api/queries/bench';
import { MEASUREMENT_KINDS, MEASUREMENT_KIND_IDS, type MeasurementKind } from '../../lib/troubleshoot/bench';
import { Dialog } from '../library/Dialog';
import { showValue, unitsFor } from './units';

type Props = {
  designId: string;
  canWrite: boolean;
  initial: MeasurementRow[];
  calibration: CalibrationView;
  today: string;
};

/** Kinds a builder can adopt in place of the prediction, and the calibration key each sets. */
const ADOPTABLE: Partial<Record<MeasurementKind, 'loadedFrequency' | 'coupling'>> = { 'loaded-frequency': 'loadedFrequency', coupling: 'coupling' };
type AdoptKey = 'loadedFrequency' | 'coupling';

function errorText(p: number | null): string {
  if (p === null) return '—';
  return `${p >= 0 ? '+' : '−'}${Math.abs(p).toFixed(1)} %`;
}

const numberText = z
  .string()
  .trim()
  .refine((t) => t !== '' && Number.isFinite(Number(t.replace(',', '.'))), 'Type the measured value as a number.');

/**
 * The form as typed: the value in the unit picked beside it. It becomes the API's own measurement body
 * (SI value), checked by the same schema the server checks it with, so the messages are the server's.
 */
const benchFormSchema = z
  .object({
    kind: measurementKindSchema,
    value: numberText,
    unitIndex: z.coerce.number().int().min(0),
    measuredAt: z.string(),
    instrument: z.string(),
    notes: z.string(),
  })
  .transform((f): MeasurementBody => {
    const units = unitsFor(f.kind);
    const unit = units[Math.min(f.unitIndex, units.length - 1)];
    return {
      kind: f.kind,
      value: Number(f.value.replace(',', '.')) * unit.factor,
      measuredAt: f.measuredAt,
      instrument: f.instrument.trim() || undefined,
      notes: f.notes.trim() || undefined,
    };
  })
  .pipe(measurementBodySchema);

type BenchForm = z.input<typeof benchFormSchema>;
type BenchBody = z.output<typeof benchFormSchema>;

/**
 * Which measurement each adopted value came from, by id. The stored calibration holds only the value, so on
 * load it is traced once to the newest row that carries exactly that value; from then on adopting and
 * dropping track the row's id.
 */
function adoptedFrom(rows: MeasurementRow[], cal: CalibrationView['calibration']): Partial<Record<AdoptKey, string>> {
  const out: Partial<Record<AdoptKey, string>> = {};
  for (const r of [...rows].reverse()) {
    const key = ADOPTABLE[r.kind as MeasurementKind];
    if (key && out[key] === undefined && cal[key] !== undefined && Object.is(cal[key], r.value)) out[key] = r.id;
  }
  return out;
}

/** The bench log: record measurements, see each beside its prediction with the error, adopt a measured value. */
function BenchLog({ designId, canWrite, initial, calibration: initialCalibration, today }: Props) {
  const { data: rows = [] } = useMeasurements(designId, initial);
  const [calibration, setCalibration] = useState(initialCalibration);
  const [adopted, setAdopted] = useState(() => adoptedFrom(initial, initialCalibration.calibration));
  const [message, setMessage] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<MeasurementRow | null>(null);
  const createMeasurement = useCreateMeasurement(designId);
  const deleteMeasurement = useDeleteMeasurement(designId);
  const putCalibration = usePutCalibration(designId);

  const defaults = useMemo<BenchForm>(
    () => ({ kind: 'loaded-frequency', value: '', unitIndex: 0, measuredAt: today, instrument: MEASUREMENT_KINDS['loaded-frequency'].instrument, notes: '' }),
    [today],
  );
  const { register, handleSubmit, watch, setValue, setError, resetField, formState } = useForm<BenchForm, unknown, BenchBody>({
    resolver: zodResolver(benchFormSchema),
    defaultValues: defaults,
  });
  const kind = watch('kind');
  const units = unitsFor(kind);
  const errors = Object.fromEntries(
    (['kind', 'value', 'measuredAt', 'instrument', 'notes'] as const).flatMap((k) => (formState.errors[k]?.message ? [[k, formState.errors[k]?.message as string]] : [])),
  ) as Record<string, string>;
  const busy = createMeasurement.isPending;

  const submit = handleSubmit(async (body) => {
    setMessage(null);
    try {
      const row = await createMeasurement.mutateAsync(body);
      resetField('value');
      resetField('notes');
      setMessage(`Recorded: ${row.label} ${showValue(row.value, row.unit)}.`);
    } catch (e) {
      if (e instanceof ApiFailure) {
        for (const [path, text] of Object.entries(e.byPath)) {
          if (path === 'kind' || path === 'value' || path === 'measuredAt' || path === 'instrument' || path === 'notes') setError(path, { type: 'server', message: text });
        }
      }
      setMessage(failureMessage(e));
    }
  });

  async function adopt(row: MeasurementRow, on: boolean) {
    const key = ADOPTABLE[row.kind as MeasurementKind];
    if (!key) return;
    const body: CalibrationBody = { [key]: on ? row.value : null };
    try {
      setCalibration(await putCalibration.mutateAsync(body));
      setAdopted((a) => ({ ...a, [key]: on ? row.id : undefined }));
      setMessage(on ? `Adopted ${showValue(row.value, row.unit)}; the tap is recalculated below.` : 'Back to the prediction.');
    } catch (e) {
      setMessage(failureMessage(e));
    }
  }

  async function remove(row: MeasurementRow) {
    try {
      await deleteMeasurement.mutateAsync(row.id);
      setMessage(`Deleted: ${row.label} of ${row.measuredAt.slice(0, 10)}.`);
    } catch (e) {
      setMessage(failureMessage(e));
    }
  }

  const fieldError = (k: string) =>
    errors[k] ? (
      <p id={`bench-${k}-error`} className="cw-field-error">
        {errors[k]}
      </p>
    ) : null;
  const cal = calibration.calibration;

  return (
    <div className="space-y-6">
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="bench-table">
          <caption className="sr-only">Measurements beside the predictions</caption>
          <thead>
            <tr className="border-b border-rule text-left">
              <th className="py-2 pr-3">Measurement</th>
              <th className="py-2 pr-3">Measured</th>
              <th className="py-2 pr-3">Predicted</th>
              <th className="py-2 pr-3">Error</th>
              <th className="py-2 pr-3">Date</th>
              <th className="py-2 pr-3">Instrument, notes</th>
              {canWrite && <th className="py-2">Actions</th>}
            </tr>
          </thead>
          <tbody>
            {rows.length === 0 && (
              <tr>
                <td colSpan={canWrite ? 7 : 6} className="py-3 text-ink-soft">
                  Nothing recorded yet.
                </td>
              </tr>
            )}
            {rows.map((r) => {
              const key = ADOPTABLE[r.kind as MeasurementKind];
              const isAdopted = key !== undefined && adopted[key] === r.id;
              return (
                <tr key={r.id} className="border-b border-rule align-top" data-kind={r.kind}>
                  <td className="py-2 pr-3">{r.label}</td>
                  <td className="py-2 pr-3 tabular-nums">{showValue(r.value, r.unit)}</td>
                  <td className="py-2 pr-3 tabular-nums">{r.predicted === null ? '—' : showValue(r.predicted, r.unit)}</td>
                  <td className="py-2 pr-3 tabular-nums" data-testid="error-percent">
                    {errorText(r.errorPercent)}
                  </td>
                  <td className="py-2 pr-3">{r.measuredAt.slice(0, 10)}</td>
                  <td className="py-2 pr-3">
                    {r.instrument}
                    {r.notes && <span className="block text-ink-soft">{r.notes}</span>}
                  </td>
                  {canWrite && (
                    <td className="space-x-2 py-2 whitespace-nowrap">
                      {key && (
                        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => void adopt(r, !isAdopted)}>
                          {isAdopted ? 'Use prediction' : 'Adopt'}
                        </button>
                      )}
                      <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => setDeleting(r)} aria-label={`Delete ${r.label} of ${r.measuredAt.slice(0, 10)}`}>
                        Delete
                      </button>
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      <div className="cw-card text-sm" data-testid="calibration">
        <h3 className="text-base font-semibold">Calibration</h3>
        {calibration.calibrated ? (
          <p>
            Adopted loaded frequency {cal.loadedFrequency ? showValue(cal.loadedFrequency, 'Hz') : 'none'}: set the tap at{' '}
            <strong>{calibration.calibrated.tapTurns === null ? 'no tap (out of range)' : `${calibration.calibrated.tapTurns.toFixed(2)} turns`}</strong>{' '}
            (predicted: {calibration.predicted.tapTurns === null ? '—' : `${calibration.predicted.tapTurns.toFixed(2)} turns`} for{' '}
            {calibration.predicted.loadedFrequency === null ? '—' : showValue(calibration.predicted.loadedFrequency, 'Hz')}).
          </p>
        ) : (
          <p className="text-ink-soft">
            Using the predictions. Adopt a measured loaded frequency to recalculate the tap; the prediction stays shown.
          </p>
        )}
        {cal.coupling !== undefined && <p>Adopted coupling k = {cal.coupling}.</p>}
      </div>

      {canWrite && (
        <form onSubmit={(e) => void submit(e)} className="cw-card grid gap-3 sm:grid-cols-2" noValidate aria-labelledby="bench-form-title">
          <h3 id="bench-form-title" className="text-base font-semibold sm:col-span-2">
            Record a measurement
          </h3>
          <div>
            <label htmlFor="bench-kind" className="cw-label">
              What you measured
            </label>
            <select
              id="bench-kind"
              className="cw-input"
              {...register('kind', {
                onChange: (e: { target: { value: string } }) => {
                  const k = e.target.value as MeasurementKind;
                  setValue('unitIndex', 0);
                  setValue('instrument', MEASUREMENT_KINDS[k].instrument);
                },
              })}
            >
              {MEASUREMENT_KIND_IDS.map((k) => (
                <option key={k} value={k}>
                  {MEASUREMENT_KINDS[k].label}
                </option>
              ))}
            </select>
            {fieldError('kind')}
          </div>
          <div className="flex gap-2">
            <div className="flex-1">
              <label htmlFor="bench-value" className="cw-label">
                Value
              </label>
              <input
                id="bench-value"
                className="cw-input"
                inputMode="decimal"
                {...register('value')}
                aria-invalid={errors.value ? true : undefined}
                aria-describedby={errors.value ? 'bench-value-error' : undefined}
              />
              {fieldError('value')}
            </div>
            {units.length > 1 && (
              <div>
                <label htmlFor="bench-unit" className="cw-label">
                  Unit
                </label>
                <select id="bench-unit" className="cw-input" {...register('unitIndex')}>
                  {units.map((u, i) => (
                    <option key={u.label} value={i}>
                      {u.label}
                    </option>
                  ))}
                </select>
              </div>
            )}
          </div>
          <div>
            <label htmlFor="bench-date" className="cw-label">
              Date measured
            </label>
            <input id="bench-date" type="date" className="cw-input" {...register('measuredAt')} aria-invalid={errors.measuredAt ? true : undefined} />
            {fieldError('measuredAt')}
          </div>
          <div>
            <label htmlFor="bench-instrument" className="cw-label">
              Instrument
            </label>
            <input id="bench-instrument" className="cw-input" {...register('instrument')} />
            {fieldError('instrument')}
          </div>
          <div className="sm:col-span-2">
            <label htmlFor="bench-notes" className="cw-label">
              Notes (room, topload height, what was nearby)
            </label>
            <textarea id="bench-notes" className="cw-input" rows={2} {...register('notes')} />
            {fieldError('notes')}
          </div>
          <div className="sm:col-span-2">
            <button type="submit" className="cw-btn cw-btn-primary" disabled={busy}>
              {busy ? 'Recording…' : 'Record measurement'}
            </button>
          </div>
        </form>
      )}
      <p role="status" aria-live="polite" className="text-sm">
        {message}
      </p>
      <Dialog open={deleting !== null} title="Delete this measurement?" onClose={() => setDeleting(null)}>
        <p>
          {deleting ? `${deleting.label}, ${showValue(deleting.value, deleting.unit)}, measured ${deleting.measuredAt.slice(0, 10)}` : ''} will be removed from the bench log.
          This cannot be undone; a value adopted from it stays adopted until you change it.
        </p>
        <div className="mt-4 flex justify-end gap-2">
          <button type="button" className="cw-btn cw-btn-quiet" onClick={() => setDeleting(null)} autoFocus>
            Keep it
          </button>
          <button
            type="button"
            className="cw-btn cw-btn-primary"
            onClick={() => {
              const row = deleting;
              setDeleting(null);
              if (row) void remove(row);
            }}
          >
            Delete measurement
          </button>
        </div>
      </Dialog>
    </div>
  );
}

export default withApi(BenchLog);
