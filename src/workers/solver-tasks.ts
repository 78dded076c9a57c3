import { parseDesign } from '../lib/design/parse';
import { FullReaderNeeded, withFullReader } from '../lib/format/units-reader';
import { fieldLabel, issueText } from '../lib/design/labels';
import { checkDesign } from '../solver/system/checks';
import {
  energyExchange,
  elevationForCoupling,
  onTimeForTargetPeak,
  solve,
  tankForTargetPeak,
  tapForTuningRatio,
  sweep,
  tankCapacitanceForTap,
  turnsForFrequency,
  windingLength,
  type DesignSI,
  type Result,
} from '../solver';
import type {
  BurstCurve,
  ChartsData,
  CouplingCurve,
  ExchangeCurve,
  Goal,
  GoalAnswer,
  SolverRequest,
  SolverResponse,
  SweepData,
  SweepRequest,
  TuningCurve,
} from './protocol';
import { solveRequest, solverFailure } from './solve-task';

const TUNING_POINTS = 60;
const COUPLING_POINTS = 60;
const EXCHANGE_POINTS = 300;

/** Loaded frequency against primary tap: sweeping the primary's turn count from the inner end gives L at each tap. */
export function tuningCurve(d: DesignSI, r: Result): TuningCurve | null {
  if (!d.primary || !r.tank || !r.system || !r.tuning) return null;
  const lo = Math.min(0.25, d.primary.turns);
  const hi = d.primary.turns;
  if (!(hi > lo)) return null;
  const s = sweep(d, 'primary.turns', lo, hi, TUNING_POINTS, ['primaryInductance']);
  const C = r.tank.capacitance;
  const rows = s.values.map((tap, i) => {
    const L = s.series.primaryInductance?.[i] ?? null;
    return { tap, primaryFrequency: L === null ? null : 1 / (2 * Math.PI * Math.sqrt(L * C)) };
  });
  return {
    rows,
    secondaryFrequency: r.system.resonantFrequency,
    targetFrequency: r.tuning.targetFrequency,
    primaryTargetFrequency: r.tuning.primaryTargetFrequency,
    tapTurns: r.tuning.tapTurns,
    tapLow: r.uncertainty?.tapTurns?.low ?? null,
    tapHigh: r.uncertainty?.tapTurns?.high ?? null,
  };
}

/** k (all primary turns) against the secondary's elevation, from level with the primary to well above it. */
export function couplingCurve(d: DesignSI, r: Result): CouplingCurve | null {
  if (!d.primary || !r.coupling) return null;
  const len = windingLength(d.secondary);
  const lo = Math.max(-d.groundClearance, Math.min(d.primary.elevation, d.secondary.elevation) - 0.05);
  const hi = Math.max(lo + 0.1, d.secondary.elevation + Math.max(0.3, 0.6 * len));
  const s = sweep(d, 'secondary.elevation', lo, hi, COUPLING_POINTS, ['k']);
  return {
    rows: s.values.map((elevation, i) => ({ elevation, k: s.series.k?.[i] ?? null })),
    elevation: d.secondary.elevation,
    k: r.coupling.k,
    targetK: d.tuning.targetCoupling,
  };
}

/** Energy in primary and secondary over time for the pair as tuned at the tap, as fractions of the start energy. */
export function exchangeCurve(r: Result): ExchangeCurve | null {
  const L1 = r.primary?.inductanceAtTap ?? null;
  const k = r.coupling?.kAtTap ?? null;
  if (L1 === null || k === null || !r.tank || !r.secondary || !r.system || !r.tuning || !(k > 0)) return null;
  const pair = { L1, C1: r.tank.capacitance, L2: r.system.effectiveInductance, C2: r.system.effectiveCapacitance + r.tuning.streamerCapacitance, k };
  const t1 = r.response?.transferTime ?? null;
  // two transfers there and back; a very loose pair would need too many cycles to show
  if (t1 === null || 2 * r.response!.f0 * t1 > 400) return null;
  const e = energyExchange(pair, { duration: 2.2 * t1, points: EXCHANGE_POINTS, stepsPerCycle: 80 });
  const rows = e.t.map((t, i) => ({ t, primary: e.primaryEnergy[i] / e.initialEnergy, secondary: e.secondaryEnergy[i] / e.initialEnergy }));
  return { rows, firstPrimaryMinimum: e.firstPrimaryMinimum, residualPrimaryEnergy: e.residualPrimaryEnergy, k };
}

const PEAK_POINTS = 200;

/** The burst of a solid-state design for its charts: the waveform, and the running peak of |primary current| against time. */
export function burstCurve(r: Result): BurstCurve | null {
  const d = r.drive;
  if (!d || d.waveform.time.length === 0) return null;
  const w = d.waveform;
  const rows = w.time.map((t, i) => ({ t, current: w.primaryCurrent[i], voltage: w.secondaryVoltage[i] }));
  // the burst is the same up to any shorter on-time, so the running peak is the peak at that on-time
  const peaks: BurstCurve['peaks'] = [];
  const every = Math.max(1, Math.floor(rows.length / PEAK_POINTS));
  let peak = 0;
  for (let i = 0; i < rows.length; i++) {
    peak = Math.max(peak, Math.abs(rows[i].current));
    if (i % every === 0 || i === rows.length - 1) peaks.push({ onTime: rows[i].t, peak });
  }
  return {
    rows,
    peaks,
    onTime: d.onTime,
    peakPrimaryCurrent: d.peakPrimaryCurrent,
    currentLimit: d.currentLimit,
    switchPeakCurrent: d.switchPeakCurrent,
    timeToCurrentLimit: d.timeToCurrentLimit,
    topology: d.topology,
  };
}

export function sweepData(d: DesignSI, req: SweepRequest): SweepData {
  const s = sweep(d, req.path, req.from, req.to, req.points, req.series);
  const rows = s.values.map((x, i) => {
    const row: Record<string, number | null> = { x };
    for (const name of req.series) row[name] = s.series[name]?.[i] ?? null;
    return row;
  });
  const firstBad = s.invalid[0];
  let invalidReason: string | null = null;
  if (firstBad !== undefined) {
    const issue = checkDesign(withValue(d, req.path, s.values[firstBad]))[0];
    invalidReason = issue ? issueText(issue) : `${fieldLabel(req.path)}: the value is out of range at this point`;
  }
  return { path: req.path, rows, series: req.series, invalid: s.invalid, invalidReason };
}

/** The design with one input set to a value, as the sweep sets it. */
function withValue(d: DesignSI, path: string, value: number): DesignSI {
  const keys = path.split('.');
  const put = (o: unknown, i: number): unknown => (i === keys.length ? value : { ...(o as Record<string, unknown>), [keys[i]]: put((o as Record<string, unknown>)[keys[i]], i + 1) });
  return put(d, 0) as DesignSI;
}

export function goalAnswer(d: DesignSI, goal: Goal): GoalAnswer | null {
  switch (goal.kind) {
    case 'frequency': {
      const r = turnsForFrequency(d, goal.hz);
      return r ? { kind: 'frequency', turns: r.turns, windingLength: r.windingLength } : null;
    }
    case 'tap': {
      const c = tankCapacitanceForTap(d, goal.turns);
      return c === null || !Number.isFinite(c) ? null : { kind: 'tap', capacitance: c };
    }
    case 'coupling': {
      const e = elevationForCoupling(d, goal.k);
      return e === null ? null : { kind: 'coupling', elevation: e };
    }
    case 'onTime': {
      const a = onTimeForTargetPeak(d, goal.peak);
      return a.ok ? { kind: 'onTime', onTime: a.value } : null;
    }
    case 'tankForCurrent': {
      const a = tankForTargetPeak(d, goal.peak);
      return a.ok ? { kind: 'tankForCurrent', ...a.value } : null;
    }
    case 'tapRatio': {
      const a = tapForTuningRatio(d, goal.ratio);
      return a.ok ? { kind: 'tapRatio', tapTurns: a.value } : null;
    }
  }
}

export { solverFailure };

/**
 * Runs one request; the same code answers in the worker and, for tests, on the main thread. Throws
 * `FullReaderNeeded` when a text needs mathjs and it is not loaded (see `runRequestLoading`).
 */
export function runRequest(id: number, request: SolverRequest, now: () => number = () => performance.now()): SolverResponse {
  if (request.type === 'solve') return solveRequest(id, request.input, now);
  try {
    const parsed = parseDesign(request.input);
    if (!parsed.ok) return { id, ok: false, issues: parsed.issues };
    const d = parsed.design;
    switch (request.type) {
      case 'sweep':
        return { id, ok: true, reply: { type: 'sweep', data: sweepData(d, request.sweep) } };
      case 'charts': {
        const result = solve(d);
        const data: ChartsData = { tuning: tuningCurve(d, result), coupling: couplingCurve(d, result), exchange: exchangeCurve(result), burst: burstCurve(result) };
        return { id, ok: true, reply: { type: 'charts', data } };
      }
      case 'goal':
        return { id, ok: true, reply: { type: 'goal', data: goalAnswer(d, request.goal) } };
    }
  } catch (e) {
    // a text needs mathjs, which is not loaded yet: `runRequestLoading` loads it and asks again
    if (e instanceof FullReaderNeeded) throw e;
    return solverFailure(id, e);
  }
}

/**
 * Runs one request as `runRequest` does, loading the full unit reader (mathjs) first when a text of the
 * design needs it: the plain forms ("12 mm", "20 nF") are read without it.
 */
export async function runRequestLoading(id: number, request: SolverRequest, now: () => number = () => performance.now()): Promise<SolverResponse> {
  try {
    return await withFullReader(() => runRequest(id, request, now));
  } catch (e) {
    return solverFailure(id, e);
  }
}
