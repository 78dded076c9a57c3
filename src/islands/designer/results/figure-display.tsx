import type { ReactNode } from 'react';
import type { Result } from '~/solver';
import type { ResultFigureId } from '~/lib/design/figures';
import { formatFixed, formatQuantity as q, type UnitSystem } from '~/lib/format';

/** How one figure shows in the results panel when it needs more than its value: a custom value, a note, or nothing. */
export interface FigureDisplay {
  /** false when the result has no such figure to show */
  shown?: (r: Result) => boolean;
  value?: (r: Result, system: UnitSystem) => string;
  note?: (r: Result, system: UnitSystem) => ReactNode;
  strong?: boolean;
}

const near = (a: number, b: number) => Math.abs(a / b - 1) < 1e-9;

/** The figure the frequency band of the uncertainty belongs to: the one whose value is the band's centre. */
export function bandFigure(r: Result): ResultFigureId | null {
  const band = r.uncertainty?.loadedFrequency;
  if (!band) return null;
  if (r.tuning && near(band.nominal, r.tuning.targetFrequency)) return 'targetFrequency';
  if (r.system && near(band.nominal, r.system.resonantFrequency)) return 'loadedFrequency';
  return r.tuning ? 'targetFrequency' : 'loadedFrequency';
}

export function bandNote(r: Result): ReactNode {
  const band = r.uncertainty?.loadedFrequency;
  if (!band) return null;
  const streamer = r.tuning ? r.tuning.targetFrequency !== r.system?.resonantFrequency : false;
  return (
    <span data-band-for={bandFigure(r) ?? undefined}>
      Likely between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}
      {streamer ? ' once streamers load the topload' : ''}: the models' stated accuracy around {q(band.nominal, 'frequency', { digits: 4 })}.
    </span>
  );
}

const present = (v: unknown) => v !== null && v !== undefined;

export const FIGURE_DISPLAY: Partial<Record<ResultFigureId, FigureDisplay>> = {
  aspectRatio: { value: (r) => `${formatFixed(r.secondary!.aspectRatio, 2)} : 1` },
  secondaryQ: { shown: (r) => present(r.secondary?.q), value: (r) => formatFixed(r.secondary!.q!, 0) },
  toploadCapacitance: { shown: (r) => present(r.topload) },
  loadedFrequency: { strong: true },
  tapTurns: { value: (r) => (r.tuning!.tapTurns === null ? 'out of reach' : formatFixed(r.tuning!.tapTurns, 2)) },
  primaryInductanceAtTap: { shown: (r) => present(r.primary?.inductanceAtTap) },
  conductorLengthAtTap: { shown: (r) => present(r.primary?.conductorLengthAtTap) },
  k: { strong: true, value: (r) => formatFixed(r.coupling!.k, 3) },
  kAtTap: { shown: (r) => present(r.coupling?.kAtTap), value: (r) => formatFixed(r.coupling!.kAtTap!, 3) },
  elevationForTargetCoupling: { shown: (r) => present(r.coupling?.elevationForTargetCoupling) },
  transferTime: {
    shown: (r) => present(r.response),
    value: (r) => q(r.response!.firstPrimaryMinimum ?? r.response!.transferTime, 'time'),
    note: (r) => <>About {formatFixed(r.response!.halfCyclesToTransfer, 1)} half-cycles; lossless estimate.</>,
  },
  fLow: { shown: (r) => present(r.response) },
  fHigh: { shown: (r) => present(r.response) },
  tankVoltageRating: { shown: (r) => present(r.tank?.voltageRating) },
  perUnitVoltage: { shown: (r) => present(r.tank?.perUnitVoltage) },
  ratingMargin: { shown: (r) => present(r.tank?.ratingMargin), value: (r) => `${formatFixed(r.tank!.ratingMargin!, 2)}×` },
  tankEnergy: { strong: true, value: (r) => (r.tank!.energyAtSupplyPeak === null ? 'add a supply' : q(r.tank!.energyAtSupplyPeak, 'energy')) },
  bleeder: {
    shown: (r) => present(r.tank?.bleeder),
    value: (r) => `${q(r.tank!.bleeder!.resistancePerUnit, 'resistance', { digits: 2 })}, ${q(r.tank!.bleeder!.powerPerUnit, 'power', { digits: 2 })}`,
    note: (r) => <>{r.tank!.bleeder!.count} resistors; the bank falls to about 1 % in {q(4.6 * r.tank!.bleeder!.timeConstant, 'time', { digits: 2 })}.</>,
  },
  ratedPower: { shown: (r) => present(r.supply?.ratedPower) },
  resonantCapacitance: { shown: (r) => present(r.supply?.resonantCapacitance) },
  ltrCapacitance: { shown: (r) => present(r.supply?.ltrCapacitance) },
  tankToResonantRatio: { shown: (r) => present(r.supply?.tankToResonantRatio), value: (r) => `${formatFixed(r.supply!.tankToResonantRatio!, 2)}×` },
  energyPerBang: { shown: (r) => present(r.supply?.energyPerBang) },
  powerAtBreakRate: { shown: (r) => present(r.supply?.powerAtBreakRate) },
  sparkLengthEstimate: { shown: (r) => present(r.supply?.sparkLengthEstimate), note: (r) => r.supply!.sparkLengthNote ?? undefined },
};
