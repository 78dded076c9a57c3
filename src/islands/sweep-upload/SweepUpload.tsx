import { useState, type ChangeEvent } from 'react';
import { findResonances, parseSweepFile, type Resonance } from '../../lib/touchstone';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useCreateMeasurement, useUploadAttachment } from '~/lib/api/queries/bench';
import SweepChart, { type ChartPoint } from './SweepChart';

type Props = {
  designId: string;
  canWrite: boolean;
  predictedLoaded: number | null;
  predictedBare: number | null;
  calibratedLoaded: number | null;
  today: string;
};

const MAX_POINTS = 2000;

/** Reads a Touchstone or CSV sweep in the browser, finds its resonances and offers to record one. */
function SweepUpload({ designId, canWrite, predictedLoaded, predictedBare, calibratedLoaded, today }: Props) {
  const [file, setFile] = useState<File | null>(null);
  const [points, setPoints] = useState<ChartPoint[]>([]);
  const [label, setLabel] = useState('');
  const [resonances, setResonances] = useState<Resonance[]>([]);
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const createMeasurement = useCreateMeasurement(designId);
  const upload = useUploadAttachment(designId);

  async function choose(e: ChangeEvent<HTMLInputElement>) {
    const f = e.target.files?.[0] ?? null;
    setError(null);
    setStatus(null);
    setPoints([]);
    setResonances([]);
    setFile(f);
    if (!f) return;
    if (f.size > 2 * 1024 * 1024) {
      setError('Sweep files may be up to 2 MB.');
      return;
    }
    const parsed = parseSweepFile(f.name, await f.text());
    if (!parsed.ok) {
      setError(parsed.error.message);
      return;
    }
    const s = parsed.value;
    const step = Math.max(1, Math.ceil(s.frequency.length / MAX_POINTS));
    const pts: ChartPoint[] = [];
    for (let i = 0; i < s.frequency.length; i += step) pts.push({ kHz: s.frequency[i] / 1e3, dB: 20 * Math.log10(Math.max(s.magnitude[i], 1e-12)) });
    setPoints(pts);
    setLabel(s.label);
    const found = findResonances(s).resonances;
    setResonances(found);
    if (found.length === 0) setError('No peak or dip found in this sweep.');
  }

  async function record(r: Resonance, kind: 'loaded-frequency' | 'bare-frequency') {
    const res = createMeasurement.mutateAsync({
      kind,
      value: r.frequency,
      measuredAt: today,
      instrument: 'swept measurement',
      notes: `${r.kind} in ${file?.name ?? 'a sweep'}${r.q !== null ? `, Q ${r.q.toFixed(1)}` : ''}`,
    });
    await res.then(
      () => setStatus(`Recorded ${(r.frequency / 1e3).toFixed(2)} kHz in the bench log; reload to see it in the table.`),
      (e) => setStatus(failureMessage(e)),
    );
  }

  async function attach() {
    if (!file) return;
    await upload.mutateAsync(file).then(
      (r) => setStatus(`Attached ${r.fileName} to the design.`),
      (e) => setStatus(failureMessage(e)),
    );
  }

  const near = (f: number | null) => (f === null ? null : f / 1e3);
  return (
    <div className="space-y-3">
      <div>
        <label htmlFor="sweep-file" className="cw-label">
          Sweep file (Touchstone .s1p/.s2p, or CSV of frequency and amplitude)
        </label>
        <input id="sweep-file" type="file" accept=".s1p,.s2p,.csv,.txt" className="cw-input" onChange={choose} aria-describedby="sweep-hint" />
        <p id="sweep-hint" className="cw-hint">
          Read in your browser. A one-port file is searched for dips of S11, a two-port file for peaks of S21; Q is the −3 dB width.
        </p>
      </div>
      {error && (
        <p className="cw-field-error" role="alert">
          {error}
        </p>
      )}
      {points.length > 0 && (
        <SweepChart
          points={points}
          label={label}
          predictedKHz={near(predictedLoaded)}
          calibratedKHz={near(calibratedLoaded)}
          peaksKHz={resonances.map((r) => r.frequency / 1e3)}
        />
      )}
      {resonances.length > 0 && (
        <table className="w-full text-sm" data-testid="resonances">
          <thead>
            <tr className="border-b border-rule text-left">
              <th className="py-1 pr-3">{resonances[0].kind === 'dip' ? 'Dip' : 'Peak'}</th>
              <th className="py-1 pr-3">Q (−3 dB)</th>
              <th className="py-1 pr-3">Against predicted loaded</th>
              {canWrite && <th className="py-1">Record as</th>}
            </tr>
          </thead>
          <tbody>
            {resonances.map((r) => (
              <tr key={r.frequency} className="border-b border-rule">
                <td className="py-1 pr-3 tabular-nums">{(r.frequency / 1e3).toFixed(2)} kHz</td>
                <td className="py-1 pr-3 tabular-nums">{r.q === null ? '—' : r.q.toFixed(1)}</td>
                <td className="py-1 pr-3 tabular-nums">{predictedLoaded ? `${(((r.frequency - predictedLoaded) / predictedLoaded) * 100).toFixed(1)} %` : '—'}</td>
                {canWrite && (
                  <td className="space-x-2 py-1">
                    <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => record(r, 'loaded-frequency')}>
                      loaded frequency
                    </button>
                    {predictedBare !== null && (
                      <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => record(r, 'bare-frequency')}>
                        bare frequency
                      </button>
                    )}
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {canWrite && file && !error && (
        <button type="button" className="cw-btn cw-btn-quiet" onClick={attach}>
          Attach this file to the design
        </button>
      )}
      <p role="status" aria-live="polite" className="text-sm">
        {status}
      </p>
    </div>
  );
}

/** Reads a Touchstone or CSV sweep in the browser, finds its resonances and offers to record one. */
export default withApi(SweepUpload);
