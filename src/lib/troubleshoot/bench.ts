import type { Result } from '../../solver';
import type { BenchValues } from './types';

/** What a builder records on the bench, each with its SI unit and the instrument usually used (T. Fritz, Tesla Coil Mailing List, May 2002; A. C. M. de Queiroz, same list, Feb 2001; common practice). */
export const MEASUREMENT_KINDS = {
  'secondary-inductance': { label: 'Secondary inductance', unit: 'H', instrument: 'LCR meter', bench: 'secondaryInductance' },
  'bare-frequency': { label: 'Resonant frequency, bare secondary', unit: 'Hz', instrument: 'signal generator and scope', bench: 'bareFrequency' },
  'loaded-frequency': { label: 'Resonant frequency with topload', unit: 'Hz', instrument: 'signal generator and scope', bench: 'loadedFrequency' },
  'primary-inductance': { label: 'Primary inductance at the tap', unit: 'H', instrument: 'LCR meter', bench: 'primaryInductance' },
  coupling: { label: 'Coupling coefficient k', unit: '1', instrument: 'line-frequency drive, M = V/(ωI)', bench: 'coupling' },
  'spark-length': { label: 'Spark length (straight line to a grounded target)', unit: 'm', instrument: 'tape measure', bench: 'sparkLength' },
  'tap-position': { label: 'Best tap found', unit: 'turns', instrument: 'tap sweep at low power', bench: 'tapTurns' },
  'wound-turns': { label: 'Secondary turns wound', unit: 'turns', instrument: 'turn counter checked against the winding height', bench: 'woundTurns' },
  'winding-length': { label: 'Secondary winding length, measured', unit: 'm', instrument: 'steel rule or tape', bench: 'windingLength' },
  // solid-state coils (common practice of bridge-driven coils)
  'primary-ring-frequency': {
    label: 'Primary ring-down frequency, bridge disconnected',
    unit: 'Hz',
    instrument: 'pulse into the tank, scope on a current transformer',
    bench: 'primaryRingFrequency',
  },
  'peak-primary-current': {
    label: 'Peak primary current at the end of the on-time',
    unit: 'A',
    instrument: 'current transformer and scope',
    bench: 'peakPrimaryCurrent',
  },
  'trip-setting': { label: 'Trip setting as measured', unit: 'A', instrument: 'controller setting, checked with a current transformer', bench: 'tripSetting' },
} as const satisfies Record<string, { label: string; unit: string; instrument: string; bench: keyof BenchValues }>;

export type MeasurementKind = keyof typeof MEASUREMENT_KINDS;
export const MEASUREMENT_KIND_IDS = Object.keys(MEASUREMENT_KINDS) as [MeasurementKind, ...MeasurementKind[]];

/** The solver's prediction a measurement of this kind is compared with; null when the design has none. */
export function predictionFor(kind: MeasurementKind, result: Result | null): number | null {
  if (!result) return null;
  switch (kind) {
    case 'secondary-inductance':
      return result.secondary?.inductance ?? null;
    case 'bare-frequency':
      return result.secondary?.resonantFrequency ?? null;
    case 'loaded-frequency':
      return result.system?.resonantFrequency ?? null;
    case 'primary-inductance':
      return result.primary?.inductanceAtTap ?? null;
    case 'coupling':
      return result.coupling?.kAtTap ?? result.coupling?.k ?? null;
    case 'spark-length':
      return result.supply?.sparkLengthEstimate ?? null;
    case 'tap-position':
      return result.tuning?.tapTurns ?? null;
    case 'wound-turns':
      return result.secondary ? Math.round(result.secondary.windingLength / result.secondary.pitch) : null;
    case 'winding-length':
      return result.secondary?.windingLength ?? null;
    case 'primary-ring-frequency':
      return result.drive?.primaryFrequency ?? null;
    case 'peak-primary-current':
      return result.drive?.peakPrimaryCurrent ?? null;
    case 'trip-setting':
      return result.drive?.currentLimit ?? null;
  }
}

/** Signed error of a measurement against its prediction, as a fraction; null without a usable prediction. */
export function relativeError(measured: number, predicted: number | null): number | null {
  if (predicted === null || !(Math.abs(predicted) > 0) || !Number.isFinite(measured)) return null;
  return (measured - predicted) / predicted;
}

/** The latest measurement of each kind (by measuredAt) as bench values for the rules. */
export function benchValues(rows: ReadonlyArray<{ kind: string; value: number; measuredAt: string | Date }>): BenchValues {
  const latest = new Map<string, { value: number; t: number }>();
  for (const r of rows) {
    if (!(r.kind in MEASUREMENT_KINDS)) continue;
    const t = new Date(r.measuredAt).getTime();
    const prev = latest.get(r.kind);
    if (!prev || t >= prev.t) latest.set(r.kind, { value: r.value, t });
  }
  const out: BenchValues = {};
  for (const [kind, { value }] of latest) out[MEASUREMENT_KINDS[kind as MeasurementKind].bench] = value;
  return out;
}
