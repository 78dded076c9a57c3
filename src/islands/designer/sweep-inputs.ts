import type { DesignSI, SweepSeriesName } from '~/solver';
import type { DisplayKind } from '~/lib/format';
import type { QuantityKind } from '~/lib/design';

export interface SweepInput {
  path: string;
  name: string;
  /** how the range is typed: a quantity with a unit, or a plain number */
  quantity: QuantityKind | null;
  display: DisplayKind;
  siUnit: string;
}

/** The inputs a builder may sweep, in the order they build the coil. */
export const SWEEP_INPUTS: readonly SweepInput[] = [
  { path: 'secondary.turns', name: 'secondary turns', quantity: null, display: 'count', siUnit: '' },
  { path: 'secondary.formDiameter', name: 'form diameter', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'secondary.windingLength', name: 'winding length', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'secondary.elevation', name: 'secondary elevation', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'groundClearance', name: 'primary plane above floor', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'topload.majorDiameter', name: 'toroid overall diameter', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'topload.minorDiameter', name: 'toroid tube diameter', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'topload.diameter', name: 'sphere diameter', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'topload.elevation', name: 'topload elevation', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'primary.turns', name: 'primary turns', quantity: null, display: 'turns', siUnit: '' },
  { path: 'primary.innerDiameter', name: 'primary inner diameter', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'primary.spacing', name: 'primary gap', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'primary.elevation', name: 'primary elevation', quantity: 'length', display: 'length', siUnit: 'm' },
  { path: 'tank.capacitance', name: 'tank capacitance', quantity: 'capacitance', display: 'capacitance', siUnit: 'F' },
  { path: 'tuning.streamerCapacitance', name: 'streamer allowance', quantity: 'capacitance', display: 'capacitance', siUnit: 'F' },
];

export interface SweepSeriesOption {
  key: SweepSeriesName;
  name: string;
  display: DisplayKind;
  siUnit: string;
  needs?: 'primary' | 'primaryTank';
}

export const SWEEP_SERIES_OPTIONS: readonly SweepSeriesOption[] = [
  { key: 'resonantFrequency', name: 'loaded frequency', display: 'frequency', siUnit: 'Hz' },
  { key: 'inductance', name: 'secondary inductance', display: 'inductance', siUnit: 'H' },
  { key: 'selfCapacitance', name: 'self-capacitance', display: 'capacitance', siUnit: 'F' },
  { key: 'k', name: 'coupling k', display: 'coupling', siUnit: '', needs: 'primary' },
  { key: 'tapTurns', name: 'tap', display: 'turns', siUnit: 'turns', needs: 'primaryTank' },
  { key: 'toploadCapacitance', name: 'topload capacitance', display: 'capacitance', siUnit: 'F' },
  { key: 'wireLength', name: 'wire length', display: 'wireLength', siUnit: 'm' },
];

/** The current value of a swept input; a close-wound winding's length is turns × insulated diameter. */
export function currentValue(d: DesignSI, path: string): number | null {
  if (path === 'secondary.windingLength') return d.secondary.windingLength ?? d.secondary.turns * d.secondary.wire.insulatedDiameter;
  let v: unknown = d;
  for (const k of path.split('.')) v = v && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined;
  return typeof v === 'number' ? v : null;
}

/** A starting range around the current value: ±40 %, or ±0.2 m for heights that may be zero. */
export function defaultRange(path: string, value: number): [number, number] {
  if (/elevation$/.test(path)) return [value - 0.1, value + 0.2];
  if (path === 'secondary.turns') return [Math.max(1, Math.round(value * 0.6)), Math.round(value * 1.4)];
  if (value === 0) return [0, path.startsWith('tuning.') ? 10e-12 : 0.1];
  return [value * 0.6, value * 1.4];
}
