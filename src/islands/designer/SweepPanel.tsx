import { lazy, memo, Suspense, useId, useMemo, useState, type FormEvent } from 'react';
import type { DesignSI } from '~/solver';
import { sweepablePaths } from '~/solver/sweep-paths';
import { formatSignificant, lengthInputText, lengthsInSystem, formatQuantity, parseQuantityLazy, readNumberText, type UnitSystem } from '~/lib/format';
import { findDesignField } from '~/lib/design/registry';
import type { SweepData } from '../../workers/protocol';
import { solverClient } from './solver-client';
import { currentValue, defaultRange, SWEEP_INPUTS, SWEEP_SERIES_OPTIONS, type SweepInput } from './sweep-inputs';

const SweepChart = lazy(() => import('../charts/SweepChart'));

type Props = { design: DesignSI; /** the design as the API takes it, read when the sweep runs */ input: () => unknown; system: UnitSystem };

function rangeText(v: number, s: SweepInput, system: UnitSystem): string {
  if (s.quantity === 'length') return lengthInputText(v, system, 4);
  if (s.quantity === 'capacitance') return formatQuantity(v, 'capacitance', { digits: 3 }).replace('µ', 'u');
  return formatSignificant(v, 4);
}

async function readRange(text: string, s: SweepInput): Promise<{ ok: true; value: number } | { ok: false; message: string }> {
  if (s.quantity === null) {
    const r = readNumberText(text);
    return r?.ok ? { ok: true, value: r.value } : { ok: false, message: r ? r.message : 'expected a number' };
  }
  return parseQuantityLazy(text, s.quantity);
}

/** Sweep any numeric input over a range and chart the results the builder picks. */
export const SweepPanel = memo(function SweepPanel({ design, input, system }: Props) {
  const ids = { path: useId(), from: useId(), to: useId(), points: useId() };
  const available = useMemo(() => {
    const paths = new Set(sweepablePaths(design));
    return SWEEP_INPUTS.filter((s) => paths.has(s.path));
  }, [design]);
  const [path, setPath] = useState(available[0]?.path ?? 'secondary.turns');
  const spec = available.find((s) => s.path === path) ?? available[0];
  const initial = spec ? defaultRange(spec.path, currentValue(design, spec.path) ?? 0) : [0, 1];
  const [from, setFrom] = useState(spec ? rangeText(initial[0], spec, system) : '');
  const [to, setTo] = useState(spec ? rangeText(initial[1], spec, system) : '');
  const [points, setPoints] = useState('25');
  const seriesOptions = SWEEP_SERIES_OPTIONS.filter((o) => !o.needs || (o.needs === 'primary' ? design.primary : design.primary && design.tank));
  const [series, setSeries] = useState<string[]>(['resonantFrequency', 'inductance', 'selfCapacitance', ...(design.primary ? ['k'] : [])]);
  const [error, setError] = useState<string | null>(null);
  const [data, setData] = useState<{ sweep: SweepData; spec: SweepInput } | null>(null);
  const [busy, setBusy] = useState(false);

  function choose(next: string) {
    setPath(next);
    const s = available.find((x) => x.path === next);
    if (!s) return;
    const [a, b] = defaultRange(s.path, currentValue(design, s.path) ?? 0);
    setFrom(rangeText(a, s, system));
    setTo(rangeText(b, s, system));
  }

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    if (!spec) return;
    const a = await readRange(from, spec);
    const b = await readRange(to, spec);
    const n = Number(points);
    // a refused sweep leaves no old chart behind
    const fail = (message: string) => {
      setData(null);
      setError(message);
    };
    const field = findDesignField(spec.path);
    const label = field?.label ?? spec.name;
    if (!a.ok) return fail(`From (${label}): ${a.message}`);
    if (!b.ok) return fail(`To (${label}): ${b.message}`);
    const bounds = field?.bounds;
    for (const [end, v] of [['From', a.value], ['To', b.value]] as const) {
      if (bounds && !(bounds.minInclusive ? v >= bounds.min : v > bounds.min) || (bounds && v > bounds.max)) {
        return fail(lengthsInSystem(`${end} (${label}): must be ${bounds!.label}, the same check as the form's`, system));
      }
    }
    if (!(a.value < b.value)) return fail('From must be less than To.');
    if (!Number.isInteger(n) || n < 2 || n > 400) return fail('Number of points: a whole number from 2 to 400.');
    const chosen = seriesOptions.filter((o) => series.includes(o.key)).map((o) => o.key);
    if (chosen.length === 0) return fail('Choose at least one quantity to plot.');
    setError(null);
    setBusy(true);
    const r = await solverClient().request({ type: 'sweep', input: input(), sweep: { path: spec.path, from: a.value, to: b.value, points: n, series: chosen } });
    setBusy(false);
    if (r.ok && r.reply.type === 'sweep') setData({ sweep: r.reply.data, spec });
    else if (!r.ok) fail(r.message ?? 'Fix the fields marked in the design first.');
  }

  const shown = data ? SWEEP_SERIES_OPTIONS.filter((o) => data.sweep.series.includes(o.key)) : [];
  return (
    <section className="cw-card space-y-3" aria-labelledby="sweep-title">
      <h3 id="sweep-title" className="text-base font-semibold">
        Sweep an input
      </h3>
      <form onSubmit={onSubmit} className="space-y-3" aria-label="Sweep settings">
        <div className="grid gap-3 sm:grid-cols-4">
          <div className="sm:col-span-2">
            <label htmlFor={ids.path} className="cw-label text-sm">
              Input to vary
            </label>
            <select id={ids.path} className="cw-input" value={path} onChange={(e) => choose(e.target.value)}>
              {available.map((s) => (
                <option key={s.path} value={s.path}>
                  {s.name}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor={ids.from} className="cw-label text-sm">
              From
            </label>
            <input id={ids.from} className="cw-input" value={from} onChange={(e) => setFrom(e.target.value)} autoComplete="off" />
          </div>
          <div>
            <label htmlFor={ids.to} className="cw-label text-sm">
              To
            </label>
            <input id={ids.to} className="cw-input" value={to} onChange={(e) => setTo(e.target.value)} autoComplete="off" />
          </div>
        </div>
        <div className="flex flex-wrap items-end gap-4">
          <fieldset>
            <legend className="cw-label text-sm">Plot</legend>
            <div className="flex flex-wrap gap-x-4 gap-y-1">
              {seriesOptions.map((o) => (
                <label key={o.key} className="flex items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="h-4 w-4 accent-copper"
                    checked={series.includes(o.key)}
                    onChange={(e) => setSeries((s) => (e.target.checked ? [...s, o.key] : s.filter((x) => x !== o.key)))}
                  />
                  {o.name}
                </label>
              ))}
            </div>
          </fieldset>
          <div className="w-36">
            <label htmlFor={ids.points} className="cw-label text-sm">
              Number of points
            </label>
            <input id={ids.points} className="cw-input" value={points} onChange={(e) => setPoints(e.target.value)} inputMode="numeric" autoComplete="off" />
          </div>
          <button type="submit" className="cw-btn cw-btn-primary" disabled={busy}>
            {busy ? 'Running…' : 'Run sweep'}
          </button>
        </div>
        <div role="alert" className={error ? 'cw-field-error' : undefined}>
          {error}
        </div>
      </form>
      {data && (
        <Suspense fallback={<p className="text-sm text-ink-soft">Loading the chart…</p>}>
          <SweepChart
            rows={data.sweep.rows}
            xName={data.spec.name}
            xKind={data.spec.display}
            xSiUnit={data.spec.siUnit}
            series={shown.map((o) => ({ key: o.key, name: o.name, kind: o.display, siUnit: o.siUnit }))}
            system={system}
            filename={`sweep-${data.spec.path.replace(/\./g, '-')}.csv`}
            invalid={data.sweep.invalid ?? []}
            invalidReason={data.sweep.invalidReason ?? null}
          />
        </Suspense>
      )}
    </section>
  );
});
