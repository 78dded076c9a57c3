import { useState, type FormEvent } from 'react';
import { MEASUREMENT_KINDS, MEASUREMENT_KIND_IDS, type MeasurementKind } from '../../lib/troubleshoot/bench';
import { createMeasurement, deleteMeasurement, putCalibration, type CalibrationView, type MeasurementRow } from './api';
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

function errorText(p: number | null): string {
  if (p === null) return '—';
  return `${p >= 0 ? '+' : '−'}${Math.abs(p).toFixed(1)} %`;
}

/** The bench log: record measurements, see each beside its prediction with the error, adopt a measured value. */
export default function BenchLog({ designId, canWrite, initial, calibration: initialCalibration, today }: Props) {
  const [rows, setRows] = useState(initial);
  const [calibration, setCalibration] = useState(initialCalibration);
  const [kind, setKind] = useState<MeasurementKind>('loaded-frequency');
  const [unitIndex, setUnitIndex] = useState(0);
  const [value, setValue] = useState('');
  const [date, setDate] = useState(today);
  const [instrument, setInstrument] = useState<string>(MEASUREMENT_KINDS['loaded-frequency'].instrument);
  const [notes, setNotes] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const units = unitsFor(kind);

  async function submit(e: FormEvent) {
    e.preventDefault();
    setMessage(null);
    const n = Number(value.trim().replace(',', '.'));
    if (value.trim() === '' || !Number.isFinite(n)) {
      setErrors({ value: 'Type the measured value as a number.' });
      return;
    }
    setBusy(true);
    const r = await createMeasurement(designId, {
      kind,
      value: n * units[Math.min(unitIndex, units.length - 1)].factor,
      measuredAt: date,
      instrument: instrument || undefined,
      notes: notes || undefined,
    });
    setBusy(false);
    if (!r.ok) {
      setErrors(Object.fromEntries(r.issues.map((i) => [i.path, i.message])));
      setMessage(r.message);
      return;
    }
    setErrors({});
    setValue('');
    setNotes('');
    setRows((old) => [...old, r.data].sort((a, b) => a.measuredAt.localeCompare(b.measuredAt)));
    setMessage(`Recorded: ${r.data.label} ${showValue(r.data.value, r.data.unit)}.`);
  }

  async function adopt(row: MeasurementRow, on: boolean) {
    const key = ADOPTABLE[row.kind as MeasurementKind];
    if (!key) return;
    const r = await putCalibration(designId, { [key]: on ? row.value : null });
    if (r.ok) setCalibration(r.data);
    setMessage(r.ok ? (on ? `Adopted ${showValue(row.value, row.unit)}; the tap is recalculated below.` : 'Back to the prediction.') : r.message);
  }

  async function remove(row: MeasurementRow) {
    const r = await deleteMeasurement(designId, row.id);
    if (r.ok) setRows((old) => old.filter((x) => x.id !== row.id));
    else setMessage(r.message);
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
              const adopted = key !== undefined && cal[key] === r.value;
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
                        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => adopt(r, !adopted)}>
                          {adopted ? 'Use prediction' : 'Adopt'}
                        </button>
                      )}
                      <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => remove(r)} aria-label={`Delete ${r.label} of ${r.measuredAt.slice(0, 10)}`}>
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
        <form onSubmit={submit} className="cw-card grid gap-3 sm:grid-cols-2" noValidate aria-labelledby="bench-form-title">
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
              value={kind}
              onChange={(e) => {
                const k = e.target.value as MeasurementKind;
                setKind(k);
                setUnitIndex(0);
                setInstrument(MEASUREMENT_KINDS[k].instrument);
              }}
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
                value={value}
                onChange={(e) => setValue(e.target.value)}
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
                <select id="bench-unit" className="cw-input" value={unitIndex} onChange={(e) => setUnitIndex(Number(e.target.value))}>
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
            <input id="bench-date" type="date" className="cw-input" value={date} onChange={(e) => setDate(e.target.value)} aria-invalid={errors.measuredAt ? true : undefined} />
            {fieldError('measuredAt')}
          </div>
          <div>
            <label htmlFor="bench-instrument" className="cw-label">
              Instrument
            </label>
            <input id="bench-instrument" className="cw-input" value={instrument} onChange={(e) => setInstrument(e.target.value)} />
            {fieldError('instrument')}
          </div>
          <div className="sm:col-span-2">
            <label htmlFor="bench-notes" className="cw-label">
              Notes (room, topload height, what was nearby)
            </label>
            <textarea id="bench-notes" className="cw-input" rows={2} value={notes} onChange={(e) => setNotes(e.target.value)} />
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
    </div>
  );
}
