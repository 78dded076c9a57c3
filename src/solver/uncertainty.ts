import { MEDHURST_ACCURACY } from './secondary/capacitance';
import { resonantFrequencyLC } from './secondary/resonance';
import type { DesignSI, UncertaintyContribution, UncertaintyResult } from './types';
import { evaluateSecondary } from './system/secondary';
import { minimumTap, primaryInductanceAtTap } from './system/primary';
import { inductanceForResonance, solveTap } from './tuning/tap';
import { STREAMER_CAPACITANCE_PER_FOOT, STREAMER_CAPACITANCE_PER_FOOT_RANGE } from './tuning/streamer';
import { SPACE_WOUND_FACTOR } from './system/design-warnings';
import { FIELD_MODEL_ACCURACY, FIELD_WINDING_ACCURACY } from './field/model';

/** Stated accuracy of each model and measurement the loaded frequency rests on. */
export const UNCERTAINTY_SOURCES = {
  /** Medhurst's own claim for his table, about ±5 % (R. G. Medhurst, Wireless Engineer 24, 1947, as quoted secondarily); doubled outside the table. */
  selfCapacitance: MEDHURST_ACCURACY,
  /** Current sheet with Rosa's corrections, close-wound: ±0.5 % (helicity neglected; from memory). */
  inductanceCloseWound: 0.005,
  /** Space-wound coils measure up to about 5 % above the corrected current-sheet value (Tesla Coil Mailing List, June 1999, pupman.com archive; single report). */
  inductanceSpaceWoundHigh: 0.05,
  /** Topload BEM is exact for an isolated body over a ground plane; nearby objects and the room: ±5 % (common practice). */
  toploadSurroundings: 0.05,
  /** Builder's measurement of the form diameter, ±1 mm by default. */
  formDiameter: 0.001,
  /** Ring-model primary inductance, ±1.5 %: the spread of the HF and LF ring models and Wheeler's spiral (H. A. Wheeler, Proc. IRE 16(10), 1928, from memory). */
  primaryInductance: 0.015,
} as const;

export interface UncertaintyBase {
  inductance: number;
  selfCapacitance: number;
  toploadCapacitance: number;
  streamerCapacitance: number;
  tankCapacitance: number | null;
  /** the tap's frequency over the loaded frequency (a dual-resonant bridge coil's tuning ratio); default 1 */
  tapFrequencyRatio?: number;
  /** when given, the band is taken around the field model's loaded frequency instead of the lumped estimate */
  field?: FieldUncertaintyBase;
}

export interface FieldUncertaintyBase {
  /** the equivalent pair at the top, streamer allowance included */
  effectiveInductance: number;
  effectiveCapacitance: number;
  /** the winding's capacitance alone in the same surroundings (linear profile), F */
  windingCapacitance: number;
  /** the field model's first mode with this capacitance from the top to ground */
  frequencyWithTopCapacitance: (extra: number) => number;
}

export interface UncertaintyOptions {
  formDiameterTolerance?: number;
}

/**
 * Propagates each source's stated range to the loaded frequency (secondary + topload + streamer
 * allowance) by evaluating the model at the ends of that range, one source at a time, and combines
 * the sources by root-sum-square on each side. Gives the tap positions for the ends of the band, with
 * the primary model's spread added in quadrature to the required inductance.
 */
export function evaluateUncertainty(d: DesignSI, base: UncertaintyBase, options: UncertaintyOptions = {}): UncertaintyResult {
  const f = (L: number, cs: number, ct: number, cx: number) => resonantFrequencyLC(L, cs + ct + cx);
  const lumpedNominal = f(base.inductance, base.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance);
  const nominal = base.field ? base.field.frequencyWithTopCapacitance(base.streamerCapacitance) : lumpedNominal;
  const rel = (x: number) => x / nominal - 1;
  const contributions: UncertaintyContribution[] = [];
  const add = (source: string, description: string, a: number, b: number) => {
    const ra = rel(a);
    const rb = rel(b);
    contributions.push({ source, description, relLow: Math.min(ra, rb, 0), relHigh: Math.max(ra, rb, 0) });
  };
  if (base.field) fieldContributions(d, base, base.field, nominal, lumpedNominal, add, options);
  else lumpedContributions(d, base, f, add, options);
  return combine(d, base, nominal, contributions);
}

type Add = (source: string, description: string, a: number, b: number) => void;

function fieldContributions(d: DesignSI, base: UncertaintyBase, field: FieldUncertaintyBase, nominal: number, lumpedNominal: number, add: Add, options: UncertaintyOptions): void {
  const u = FIELD_MODEL_ACCURACY;
  add(
    'fieldModel',
    `Field model ±${pct(u)} on the effective capacitance: the winding as a smooth sheet, an ideal ground plane, nothing else in the room (judgement)`,
    nominal / Math.sqrt(1 + u),
    nominal / Math.sqrt(1 - u),
  );
  if (field.windingCapacitance > 0) {
    const w = FIELD_WINDING_ACCURACY * field.windingCapacitance;
    const C = field.effectiveCapacitance;
    add(
      'windingCapacitance',
      `Winding's own capacitance ±${pct(FIELD_WINDING_ACCURACY)}: the quasi-static field model against Medhurst's measured table ` +
        '(R. G. Medhurst, Wireless Engineer 24, 1947; −11 % to +26 % over ℓ/D 1–5)',
      nominal * Math.sqrt(C / (C + w)),
      nominal * Math.sqrt(C / Math.max(C - w, 0.5 * C)),
    );
  }
  const sv = evaluateSecondary(d.secondary);
  const spaceWound = sv.pitch > SPACE_WOUND_FACTOR * d.secondary.wire.insulatedDiameter;
  const lLow = UNCERTAINTY_SOURCES.inductanceCloseWound;
  const lHigh = spaceWound ? UNCERTAINTY_SOURCES.inductanceSpaceWoundHigh : UNCERTAINTY_SOURCES.inductanceCloseWound;
  add(
    'inductance',
    inductanceSource(spaceWound),
    nominal / Math.sqrt(1 + lHigh),
    nominal / Math.sqrt(1 - lLow),
  );
  if (base.toploadCapacitance > 0) {
    const delta = UNCERTAINTY_SOURCES.toploadSurroundings * base.toploadCapacitance;
    const C = field.effectiveCapacitance;
    add(
      'toploadSurroundings',
      'Topload capacitance ±5 %: nearby objects and the room, which the ground-plane model leaves out (common practice)',
      nominal * Math.sqrt(C / (C + delta)),
      nominal * Math.sqrt(C / Math.max(C - delta, 0.5 * C)),
    );
  }
  if (base.streamerCapacitance > 0) {
    const lo = STREAMER_CAPACITANCE_PER_FOOT_RANGE.low / STREAMER_CAPACITANCE_PER_FOOT;
    const hi = STREAMER_CAPACITANCE_PER_FOOT_RANGE.high / STREAMER_CAPACITANCE_PER_FOOT;
    add(
      'streamerAllowance',
      'Streamer allowance 0.8–2 pF per foot instead of 1 pF per foot (T. Fritz, Tesla Coil Mailing List, 2002 and 2005; common practice)',
      field.frequencyWithTopCapacitance(base.streamerCapacitance * lo),
      field.frequencyWithTopCapacitance(base.streamerCapacitance * hi),
    );
  }
  // The form diameter's effect is taken from the lumped model's relative change (re-solving the field model
  // for each end would triple its cost on every geometry change).
  const tol = options.formDiameterTolerance ?? UNCERTAINTY_SOURCES.formDiameter;
  const atForm = (delta: number) => {
    const v = evaluateSecondary({ ...d.secondary, formDiameter: d.secondary.formDiameter + delta });
    return (nominal * resonantFrequencyLC(v.inductance, v.selfCapacitance + base.toploadCapacitance + base.streamerCapacitance)) / lumpedNominal;
  };
  add('formDiameter', `Form diameter measured to ±${(tol * 1000).toFixed(1)} mm`, atForm(-tol), atForm(tol));
}

function lumpedContributions(
  d: DesignSI,
  base: UncertaintyBase,
  f: (L: number, cs: number, ct: number, cx: number) => number,
  add: Add,
  options: UncertaintyOptions,
): void {

  const sv = evaluateSecondary(d.secondary);
  const medhurst = UNCERTAINTY_SOURCES.selfCapacitance * (sv.selfCapacitanceInRange ? 1 : 2);
  add(
    'selfCapacitance',
    `Medhurst self-capacitance ±${pct(medhurst)} (Medhurst 1947, his stated accuracy${sv.selfCapacitanceInRange ? '' : ', doubled: outside his table'})`,
    f(base.inductance, base.selfCapacitance * (1 - medhurst), base.toploadCapacitance, base.streamerCapacitance),
    f(base.inductance, base.selfCapacitance * (1 + medhurst), base.toploadCapacitance, base.streamerCapacitance),
  );

  const spaceWound = sv.pitch > SPACE_WOUND_FACTOR * d.secondary.wire.insulatedDiameter;
  const lLow = UNCERTAINTY_SOURCES.inductanceCloseWound;
  const lHigh = spaceWound ? UNCERTAINTY_SOURCES.inductanceSpaceWoundHigh : UNCERTAINTY_SOURCES.inductanceCloseWound;
  add(
    'inductance',
    inductanceSource(spaceWound),
    f(base.inductance * (1 - lLow), base.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance),
    f(base.inductance * (1 + lHigh), base.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance),
  );

  if (base.toploadCapacitance > 0) {
    const u = UNCERTAINTY_SOURCES.toploadSurroundings;
    add(
      'toploadSurroundings',
      'Topload capacitance ±5 %: nearby objects and the room, which the ground-plane model leaves out (common practice)',
      f(base.inductance, base.selfCapacitance, base.toploadCapacitance * (1 - u), base.streamerCapacitance),
      f(base.inductance, base.selfCapacitance, base.toploadCapacitance * (1 + u), base.streamerCapacitance),
    );
  }

  if (base.streamerCapacitance > 0) {
    const lo = STREAMER_CAPACITANCE_PER_FOOT_RANGE.low / STREAMER_CAPACITANCE_PER_FOOT;
    const hi = STREAMER_CAPACITANCE_PER_FOOT_RANGE.high / STREAMER_CAPACITANCE_PER_FOOT;
    add(
      'streamerAllowance',
      'Streamer allowance 0.8–2 pF per foot instead of 1 pF per foot (T. Fritz, Tesla Coil Mailing List, 2002 and 2005; common practice)',
      f(base.inductance, base.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance * lo),
      f(base.inductance, base.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance * hi),
    );
  }

  const tol = options.formDiameterTolerance ?? UNCERTAINTY_SOURCES.formDiameter;
  const atForm = (delta: number) => {
    const v = evaluateSecondary({ ...d.secondary, formDiameter: d.secondary.formDiameter + delta });
    return f(v.inductance, v.selfCapacitance, base.toploadCapacitance, base.streamerCapacitance);
  };
  add('formDiameter', `Form diameter measured to ±${(tol * 1000).toFixed(1)} mm`, atForm(-tol), atForm(tol));
}

function combine(d: DesignSI, base: UncertaintyBase, nominal: number, contributions: UncertaintyContribution[]): UncertaintyResult {
  const down = Math.sqrt(contributions.reduce((a, c) => a + c.relLow * c.relLow, 0));
  const up = Math.sqrt(contributions.reduce((a, c) => a + c.relHigh * c.relHigh, 0));
  const low = nominal * (1 - down);
  const high = nominal * (1 + up);

  let tapTurns: UncertaintyResult['tapTurns'] = null;
  const p = d.primary;
  if (p && base.tankCapacitance !== null) {
    const required = inductanceForResonance(nominal * (base.tapFrequencyRatio ?? 1), base.tankCapacitance);
    const dp = UNCERTAINTY_SOURCES.primaryInductance;
    const more = Math.sqrt(((nominal / low) ** 2 - 1) ** 2 + dp * dp);
    const less = Math.sqrt((1 - (nominal / high) ** 2) ** 2 + dp * dp);
    const tapFor = (L: number) => solveTap((t) => primaryInductanceAtTap(p, t), L, minimumTap(p), p.turns, 1e-6).tapTurns;
    tapTurns = { low: tapFor(required * (1 - less)), high: tapFor(required * (1 + more)) };
  }

  return {
    loadedFrequency: { nominal, low, high, contributions },
    tapTurns,
    method:
      (base.field ? 'Around the field model\'s loaded frequency (streamer allowance included). ' : '') +
      'Each source is moved to the ends of its stated range on its own; the changes are combined by root-sum-square on each side. ' +
      'The tap range adds the primary inductance model spread (±1.5 %) in quadrature.',
  };
}

function pct(x: number): string {
  return `${Number((x * 100).toFixed(1))} %`;
}

/** The inductance line of the band and its source, by how the secondary is wound. */
function inductanceSource(spaceWound: boolean): string {
  return spaceWound
    ? 'Secondary inductance −0.5 %/+5 %: space-wound coils measure above the current-sheet value (builders\' reports, Tesla Coil Mailing List, 1999)'
    : 'Secondary inductance ±0.5 %: current sheet with Rosa corrections, helicity neglected (from memory)';
}
