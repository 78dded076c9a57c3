import { resonantFrequencyLC } from './secondary/resonance';
import type { DesignSI } from './types';
import { sweepablePaths } from './sweep-paths';

export { sweepablePaths };
import { checkDesign } from './system/checks';
import { evaluateSecondary } from './system/secondary';
import { evaluateTopload } from './system/topload';
import { evaluateCoupling, evaluatePrimary, minimumTap, primaryInductanceAtTap } from './system/primary';
import { inductanceForResonance, solveTap } from './tuning/tap';
import { evaluateTank } from './tank/evaluate';
import { pchip } from './math/pchip';
import { evaluateFieldModel } from './field/model';

// beyond this many points the topload capacitance is interpolated between exact evaluations
const TOPLOAD_NODES = 25;
// field-model evaluations per sweep (the loaded frequency's ratio to the lumped estimate is interpolated between them)
const FIELD_NODES = 9;

/** Quantities a sweep can chart; all in SI base units. */
export const SWEEP_SERIES = [
  'resonantFrequency', // loaded: secondary + topload, field model
  'unloadedFrequency',
  'targetFrequency', // loaded + streamer allowance
  'inductance',
  'selfCapacitance',
  'toploadCapacitance',
  'wireLength',
  'aspectRatio',
  'primaryInductance',
  'mutualInductance',
  'k',
  'tapTurns',
] as const;

export type SweepSeriesName = (typeof SWEEP_SERIES)[number];

export const DEFAULT_SWEEP_SERIES: readonly SweepSeriesName[] = ['resonantFrequency', 'inductance', 'selfCapacitance', 'k'];

export interface SweepResult {
  path: string;
  values: number[];
  /** one entry per value; null where the design is not buildable or the quantity does not apply */
  series: Partial<Record<SweepSeriesName, Array<number | null>>>;
  /** indices of values at which the design fails its cross-field checks */
  invalid: number[];
}

function setPath(d: DesignSI, path: string, value: number): DesignSI {
  const keys = path.split('.');
  const clone = (obj: unknown, i: number): unknown => {
    if (i === keys.length) return value;
    const o = obj as Record<string, unknown>;
    return { ...o, [keys[i]]: clone(o[keys[i]], i + 1) };
  };
  return clone(d, 0) as DesignSI;
}

/**
 * Varies one numeric SI input of a design from `from` to `to` in `points` evenly spaced steps and
 * returns the requested quantities at each step, for charts. Only the parts of the model the
 * requested series need are evaluated (the topload capacitance is memoised by geometry), so a
 * 200-point sweep of the default series takes tens of milliseconds.
 * Throws a RangeError naming the problem when the path is not a numeric field of the design.
 */
export function sweep(
  design: DesignSI,
  path: string,
  from: number,
  to: number,
  points: number,
  series: readonly string[] = DEFAULT_SWEEP_SERIES,
): SweepResult {
  if (!sweepablePaths(design).includes(path)) {
    throw new RangeError(`sweep: "${path}" is not a numeric field of this design; try one of ${sweepablePaths(design).join(', ')}`);
  }
  const unknown = series.filter((s) => !(SWEEP_SERIES as readonly string[]).includes(s));
  if (unknown.length > 0) throw new RangeError(`sweep: unknown series ${unknown.join(', ')}; known: ${SWEEP_SERIES.join(', ')}`);
  if (!Number.isFinite(from) || !Number.isFinite(to)) throw new RangeError('sweep: from and to must be finite numbers');
  const n = Math.floor(points);
  if (!(n >= 2 && n <= 10000)) throw new RangeError('sweep: points must be between 2 and 10000');

  const wanted = new Set(series as readonly SweepSeriesName[]);
  const needTopload = ['resonantFrequency', 'targetFrequency', 'toploadCapacitance', 'tapTurns'].some((s) => wanted.has(s as SweepSeriesName));
  const needPrimary = ['primaryInductance', 'mutualInductance', 'k', 'tapTurns'].some((s) => wanted.has(s as SweepSeriesName));
  const needCoupling = wanted.has('mutualInductance') || wanted.has('k');

  const values: number[] = [];
  const out: Partial<Record<SweepSeriesName, Array<number | null>>> = {};
  for (const s of wanted) out[s] = [];
  const invalid: number[] = [];

  const designs: DesignSI[] = [];
  const valid: boolean[] = [];
  for (let i = 0; i < n; i++) {
    const x = from + ((to - from) * i) / (n - 1);
    values.push(x);
    const d = setPath(design, path, x);
    designs.push(d);
    valid.push(pointIsPositive(path, x) && checkDesign(d).length === 0);
  }
  const toploadAt = needTopload && design.topload ? toploadInterpolant(designs, values, valid) : null;
  const needField = ['resonantFrequency', 'targetFrequency', 'tapTurns'].some((s) => wanted.has(s as SweepSeriesName));
  const fieldAt = needField ? fieldRatioInterpolant(designs, values, valid) : null;

  for (let i = 0; i < n; i++) {
    const d = designs[i];
    const row: Partial<Record<SweepSeriesName, number | null>> = {};
    const ok = valid[i];
    if (!ok) invalid.push(i);
    if (ok) {
      try {
        const sv = evaluateSecondary(d.secondary);
        row.inductance = sv.inductance;
        row.selfCapacitance = sv.selfCapacitance;
        row.wireLength = sv.wireLength;
        row.aspectRatio = sv.aspectRatio;
        row.unloadedFrequency = resonantFrequencyLC(sv.inductance, sv.selfCapacitance);
        let ct = 0;
        if (toploadAt && d.topload) ct = toploadAt(i);
        row.toploadCapacitance = d.topload ? (needTopload ? ct : null) : null;
        const ratio = fieldAt ? fieldAt(i) : { loaded: 1, target: 1 };
        row.resonantFrequency = resonantFrequencyLC(sv.inductance, sv.selfCapacitance + ct) * ratio.loaded;
        const target = resonantFrequencyLC(sv.inductance, sv.selfCapacitance + ct + d.tuning.streamerCapacitance) * ratio.target;
        row.targetFrequency = target;
        const p = d.primary;
        if (needPrimary && p) {
          const pv = evaluatePrimary(p);
          row.primaryInductance = pv.inductance;
          if (needCoupling) {
            const c = evaluateCoupling(p, d.secondary, pv.inductance, sv.inductance);
            row.mutualInductance = c.mutualInductance;
            row.k = c.k;
          }
          if (wanted.has('tapTurns') && d.tank) {
            const C = evaluateTank(d.tank, d.supply).capacitance;
            row.tapTurns = solveTap((t) => primaryInductanceAtTap(p, t), inductanceForResonance(target, C), minimumTap(p), p.turns, 1e-6).tapTurns;
          }
        }
      } catch {
        invalid.push(i);
        for (const k of Object.keys(row)) delete row[k as SweepSeriesName];
      }
    }
    for (const s of wanted) {
      const v = row[s];
      out[s]!.push(typeof v === 'number' && Number.isFinite(v) ? v : null);
    }
  }
  return { path, values, series: out, invalid };
}

/**
 * Topload capacitance along the sweep. The BEM solve dominates a sweep's cost, and the capacitance is
 * a smooth function of any one input, so with many points it is evaluated exactly at TOPLOAD_NODES
 * evenly spread valid points and interpolated (monotone cubic) in between; tests hold the
 * interpolation within 1e-5 of the exact value.
 */
function toploadInterpolant(designs: DesignSI[], xs: number[], valid: boolean[]): (i: number) => number {
  const exact = (i: number) => evaluateTopload(designs[i], designs[i].topload!).capacitance;
  const validIdx = valid.flatMap((v, i) => (v && designs[i].topload ? [i] : []));
  if (validIdx.length <= TOPLOAD_NODES || xs[validIdx[0]] === xs[validIdx[validIdx.length - 1]]) return exact;
  const picks = new Set<number>();
  for (let j = 0; j < TOPLOAD_NODES; j++) picks.add(validIdx[Math.round((j * (validIdx.length - 1)) / (TOPLOAD_NODES - 1))]);
  const nodes = [...picks].sort((a, b) => xs[a] - xs[b]);
  const f = pchip(nodes.map((i) => xs[i]), nodes.map(exact));
  const atNode = new Map(nodes.map((i) => [i, true]));
  return (i: number) => (atNode.has(i) ? exact(i) : f(xs[i]));
}

/**
 * The field model's loaded and target frequencies as ratios to the lumped estimate along the sweep. The field
 * model dominates a sweep's cost, and the ratio is a smooth, slowly varying function of any one input, so with
 * many points it is evaluated exactly at FIELD_NODES evenly spread valid points and interpolated (monotone
 * cubic) in between; tests hold the result within 2e-4 of solve() between nodes and exact at them.
 */
function fieldRatioInterpolant(designs: DesignSI[], xs: number[], valid: boolean[]): (i: number) => { loaded: number; target: number } {
  const exact = (i: number) => {
    const d = designs[i];
    const sv = evaluateSecondary(d.secondary);
    const ct = d.topload ? evaluateTopload(d, d.topload).capacitance : 0;
    const field = evaluateFieldModel(d, sv.inductance);
    return {
      loaded: field.modes[0] / resonantFrequencyLC(sv.inductance, sv.selfCapacitance + ct),
      target: field.frequencyWithTopCapacitance(d.tuning.streamerCapacitance) / resonantFrequencyLC(sv.inductance, sv.selfCapacitance + ct + d.tuning.streamerCapacitance),
    };
  };
  const validIdx = valid.flatMap((v, i) => (v ? [i] : []));
  if (validIdx.length <= FIELD_NODES || xs[validIdx[0]] === xs[validIdx[validIdx.length - 1]]) return exact;
  const picks = new Set<number>();
  for (let j = 0; j < FIELD_NODES; j++) picks.add(validIdx[Math.round((j * (validIdx.length - 1)) / (FIELD_NODES - 1))]);
  const nodes = [...picks].sort((a, b) => xs[a] - xs[b]);
  const atNodes = new Map(nodes.map((i) => [i, exact(i)]));
  const loaded = pchip(nodes.map((i) => xs[i]), nodes.map((i) => atNodes.get(i)!.loaded));
  const target = pchip(nodes.map((i) => xs[i]), nodes.map((i) => atNodes.get(i)!.target));
  return (i: number) => atNodes.get(i) ?? { loaded: loaded(xs[i]), target: target(xs[i]) };
}

// counts, diameters and capacitances must stay positive; elevations may go negative
function pointIsPositive(path: string, x: number): boolean {
  if (/elevation$/.test(path)) return Number.isFinite(x);
  if (path === 'groundClearance' || path === 'primary.spacing' || path.startsWith('tuning.')) return x >= 0;
  return x > 0;
}
