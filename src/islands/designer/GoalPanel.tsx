import { memo, useId, useState, type FormEvent } from 'react';
import { browserDecimalMark, formatFixed, parseQuantityLazy, readNumberText, type UnitSystem } from '~/lib/format';
import type { Goal, GoalAnswer } from '../../workers/protocol';
import { solverClient } from './solver-client';

type Props = {
  /** the design as it stands, as the API takes it, read when a goal runs */
  input: () => unknown;
  system: UnitSystem;
  hasPrimary: boolean;
  hasTank: boolean;
  /** a solid-state supply: offers the drive's goals */
  bridge: boolean;
  readOnly: boolean;
  /** writes the answer into the form, saying what changed, with an undo */
  apply: (answer: GoalAnswer, goal: Goal) => GoalApplied;
};

/** What a goal did to the form: what changed (or why nothing did), and how to put it back. */
export type GoalApplied = { ok: true; message: string; undo: () => void } | { ok: false; message: string };

const TAP_LABEL = 'Tap at (turns from the inner end)';
const K_LABEL = 'Coupling to reach (sets the secondary elevation)';

type Status = { tone: 'ok' | 'fault'; text: string; undo?: () => void } | null;

/** Goal-first entry: fix what the coil must do and let the solver's inverse functions fill in the input. */
export const GoalPanel = memo(function GoalPanel({ input, system: _system, hasPrimary, hasTank, bridge, readOnly, apply }: Props) {
  const [freq, setFreq] = useState('');
  const [tap, setTap] = useState('');
  const [k, setK] = useState('');
  const [peak, setPeak] = useState('');
  const [tankPeak, setTankPeak] = useState('');
  const [ratio, setRatio] = useState('');
  const [status, setStatus] = useState<Record<Goal['kind'], Status>>({ frequency: null, tap: null, coupling: null, onTime: null, tankForCurrent: null, tapRatio: null });
  const [busy, setBusy] = useState<Goal['kind'] | null>(null);
  const ids = { f: useId(), t: useId(), k: useId(), p: useId(), c: useId(), r: useId() };

  async function run(goal: Goal, unreachable: string) {
    setBusy(goal.kind);
    try {
      const r = await solverClient().request({ type: 'goal', input: input(), goal });
      if (!r.ok) {
        setStatus((s) => ({ ...s, [goal.kind]: { tone: 'fault', text: r.message ?? 'Fix the fields marked in the design first.' } }));
      } else if (r.reply.type === 'goal' && r.reply.data) {
        const done = apply(r.reply.data, goal);
        setStatus((s) => ({ ...s, [goal.kind]: done.ok ? { tone: 'ok', text: `Changed: ${done.message}`, undo: done.undo } : { tone: 'fault', text: done.message } }));
      } else setStatus((s) => ({ ...s, [goal.kind]: { tone: 'fault', text: unreachable } }));
    } finally {
      setBusy(null);
    }
  }

  async function onFrequency(e: FormEvent) {
    e.preventDefault();
    const p = await parseQuantityLazy(freq, 'frequency');
    if (!p.ok || !(p.value > 0)) return setStatus((s) => ({ ...s, frequency: { tone: 'fault', text: `Target frequency: ${p.ok ? 'must be above 0' : p.message}` } }));
    void run(
      { kind: 'frequency', hz: p.value },
      'No turn count that fits reaches this frequency with this form and wire.',
    );
  }

  function onTap(e: FormEvent) {
    e.preventDefault();
    const read = readNumberText(tap, browserDecimalMark());
    const t = read?.ok ? read.value : NaN;
    if (!Number.isFinite(t) || t <= 0) return setStatus((s) => ({ ...s, tap: { tone: 'fault', text: `${TAP_LABEL}: ${read && !read.ok ? read.message : 'enter the turns from the inner end, e.g. 8.5'}` } }));
    void run({ kind: 'tap', turns: t }, `No tank capacitance puts the tap at ${formatFixed(t, 2)} turns on this primary.`);
  }

  function onCoupling(e: FormEvent) {
    e.preventDefault();
    const read = readNumberText(k, browserDecimalMark());
    const v = read?.ok ? read.value : NaN;
    if (!Number.isFinite(v) || v <= 0 || v > 0.9) return setStatus((s) => ({ ...s, coupling: { tone: 'fault', text: `${K_LABEL}: enter a number above 0 and at most 0.9, e.g. 0.15` } }));
    void run(
      { kind: 'coupling', k: v },
      'No secondary elevation gives this k with this primary; more primary turns near the secondary couple tighter.',
    );
  }

  async function onPeak(e: FormEvent) {
    e.preventDefault();
    const p = await parseQuantityLazy(peak, 'current');
    if (!p.ok || !(p.value > 0)) return setStatus((s) => ({ ...s, onTime: { tone: 'fault', text: `Target peak current: ${p.ok ? 'must be above 0' : p.message}` } }));
    void run(
      { kind: 'onTime', peak: p.value },
      'The primary current does not reach this peak within 1 ms: losses and the secondary’s load cap it.',
    );
  }

  async function onTankPeak(e: FormEvent) {
    e.preventDefault();
    const p = await parseQuantityLazy(tankPeak, 'current');
    if (!p.ok || !(p.value > 0)) return setStatus((s) => ({ ...s, tankForCurrent: { tone: 'fault', text: `Target peak current: ${p.ok ? 'must be above 0' : p.message}` } }));
    void run(
      { kind: 'tankForCurrent', peak: p.value },
      'No tank capacitance gives this peak at this on-time.',
    );
  }

  function onRatio(e: FormEvent) {
    e.preventDefault();
    const v = Number(ratio.replace(',', '.'));
    if (!Number.isFinite(v) || v < 0.5 || v > 1.5) return setStatus((s) => ({ ...s, tapRatio: { tone: 'fault', text: 'Ratio: enter a number between 0.5 and 1.5, e.g. 0.9' } }));
    void run(
      { kind: 'tapRatio', ratio: v },
      'No tap of this primary reaches that ratio with this tank.',
    );
  }

  const line = (kind: Goal['kind']) => {
    const s = status[kind];
    return (
      <div>
        <p role="status" className={s ? (s.tone === 'ok' ? 'text-sm text-sound' : 'cw-field-error') : 'sr-only'} data-goal-status={kind}>
          {s?.text ?? ''}
        </p>
        {s?.undo && (
          <button
            type="button"
            className="cw-btn cw-btn-quiet mt-1 text-sm"
            onClick={() => {
              s.undo?.();
              setStatus((st) => ({ ...st, [kind]: { tone: 'ok', text: 'Put back as it was.' } }));
            }}
          >
            Undo
          </button>
        )}
      </div>
    );
  };

  return (
    <section className="cw-card space-y-4" aria-labelledby="goal-title">
      <div>
        <h2 id="goal-title" className="text-lg font-semibold">
          Start from a goal
        </h2>
        <p className="cw-hint">Fix a number the coil must meet; the matching input is filled in for you.</p>
      </div>
      <form onSubmit={onFrequency} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
        <div>
          <label htmlFor={ids.f} className="cw-label text-sm">
            Target loaded frequency
          </label>
          <input id={ids.f} className="cw-input" value={freq} onChange={(e) => setFreq(e.target.value)} placeholder="e.g. 250 kHz" disabled={readOnly} autoComplete="off" />
        </div>
        <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || busy !== null}>
          Fill in turns
        </button>
        <div className="sm:col-span-2">{line('frequency')}</div>
      </form>
      <form onSubmit={onTap} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
        <div>
          <label htmlFor={ids.t} className="cw-label text-sm">
            {TAP_LABEL}
          </label>
          <input id={ids.t} className="cw-input" value={tap} onChange={(e) => setTap(e.target.value)} placeholder="e.g. 8.5" inputMode="decimal" disabled={readOnly || !hasPrimary} autoComplete="off" />
        </div>
        <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || !hasPrimary || busy !== null}>
          Fill in the tank
        </button>
        <div className="sm:col-span-2">{hasPrimary ? line('tap') : <p className="cw-hint">Needs a primary.</p>}</div>
      </form>
      <form onSubmit={onCoupling} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
        <div>
          <label htmlFor={ids.k} className="cw-label text-sm">
            {K_LABEL}
          </label>
          <input id={ids.k} className="cw-input" value={k} onChange={(e) => setK(e.target.value)} placeholder="e.g. 0.15" inputMode="decimal" disabled={readOnly || !hasPrimary} autoComplete="off" />
        </div>
        <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || !hasPrimary || busy !== null}>
          Fill in elevation
        </button>
        <div className="sm:col-span-2">{hasPrimary ? line('coupling') : <p className="cw-hint">Needs a primary.</p>}</div>
      </form>
      {!hasTank && hasPrimary && <p className="cw-hint">The tap goal needs a tank capacitor or will add one.</p>}
      {bridge && (
        <>
          <form onSubmit={onPeak} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
            <div>
              <label htmlFor={ids.p} className="cw-label text-sm">
                Target peak primary current
              </label>
              <input id={ids.p} className="cw-input" value={peak} onChange={(e) => setPeak(e.target.value)} placeholder="e.g. 400 A" disabled={readOnly || !hasPrimary} autoComplete="off" />
            </div>
            <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || !hasPrimary || busy !== null}>
              Fill in on-time
            </button>
            <div className="sm:col-span-2">{line('onTime')}</div>
          </form>
          <form onSubmit={onTankPeak} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
            <div>
              <label htmlFor={ids.c} className="cw-label text-sm">
                Peak primary current at this on-time
              </label>
              <input id={ids.c} className="cw-input" value={tankPeak} onChange={(e) => setTankPeak(e.target.value)} placeholder="e.g. 400 A" disabled={readOnly || !hasTank} autoComplete="off" />
            </div>
            <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || !hasTank || busy !== null}>
              Fill in tank capacitance
            </button>
            <div className="sm:col-span-2">{line('tankForCurrent')}</div>
          </form>
          <form onSubmit={onRatio} className="grid gap-2 sm:grid-cols-[1fr_auto] sm:items-end">
            <div>
              <label htmlFor={ids.r} className="cw-label text-sm">
                Primary frequency as a share of the secondary
              </label>
              <input id={ids.r} className="cw-input" value={ratio} onChange={(e) => setRatio(e.target.value)} placeholder="e.g. 0.9" inputMode="decimal" disabled={readOnly || !hasTank} autoComplete="off" />
            </div>
            <button type="submit" className="cw-btn cw-btn-quiet" disabled={readOnly || !hasTank || busy !== null}>
              Find the tap
            </button>
            <div className="sm:col-span-2">{line('tapRatio')}</div>
          </form>
        </>
      )}
    </section>
  );
});
