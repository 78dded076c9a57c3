import { resonantFrequencyLC, quarterWaveFrequency, qualityFactor } from './secondary/resonance';
import { acResistanceRoundWire } from './wire/resistance';
import type {
  CouplingResult,
  DesignSI,
  PrimaryResult,
  ResponseResult,
  Result,
  SecondaryResult,
  SolverWarning,
  SupplyResult,
  SystemResult,
  ToploadResult,
  TuningResult,
  UncertaintyResult,
} from './types';
import { warning } from './warnings';
import { evaluateSecondary } from './system/secondary';
import { evaluateTopload } from './system/topload';
import {
  evaluateCoupling,
  evaluatePrimary,
  minimumTap,
  primaryConductorLengthAtTap,
  primaryInductanceAtTap,
} from './system/primary';
import { sanitizeNumbers } from './system/sanitize';
import { inductanceForResonance, solveTap } from './tuning/tap';
import { evaluateTank, evaluateSupply } from './tank/evaluate';
import { evaluateResponse } from './response/evaluate';
import { designWarnings } from './system/design-warnings';
import { elevationForCoupling } from './inverse';
import { evaluateUncertainty } from './uncertainty';

export const LUMPED_MODEL_NOTE =
  'Lumped model: the secondary is its low-frequency inductance resonating with its Medhurst self-capacitance ' +
  'plus the topload capacitance in parallel; distributed (transmission-line) effects are left out.';

function attempt<T>(label: string, path: string, warnings: SolverWarning[], f: () => T): T | null {
  try {
    return f();
  } catch (e) {
    const detail = e instanceof Error && e.message ? ` (${e.message})` : '';
    warnings.push(warning('computation_failed', path, `${label} could not be computed for this design${detail}`));
    return null;
  }
}

/**
 * Solves one design: secondary, topload, loaded resonance, primary, coupling, tuning tap, tank and supply,
 * the coupled response and the uncertainty band. Pure: numbers in SI base units in, plain object out.
 * Sections whose inputs are absent are null; the result never holds NaN or Infinity.
 * The design should have passed `checkDesign` (the schema's parser runs it).
 */
export function solve(design: DesignSI): Result {
  const warnings: SolverWarning[] = [];
  const s = design.secondary;

  const sv = attempt('The secondary', 'secondary', warnings, () => evaluateSecondary(s));
  const tl = design.topload ? attempt('The topload capacitance', 'topload', warnings, () => evaluateTopload(design, design.topload!)) : null;

  let secondary: SecondaryResult | null = null;
  let system: SystemResult | null = null;
  let topload: ToploadResult | null = null;
  if (tl) topload = { capacitance: tl.capacitance, centreHeightAboveGround: tl.centreHeightAboveGround, empirical: tl.empirical };

  if (sv) {
    const totalCapacitance = sv.selfCapacitance + (tl?.capacitance ?? 0);
    const fLoaded = resonantFrequencyLC(sv.inductance, totalCapacitance);
    const acResistance = attempt('The AC resistance', 'secondary.wire', warnings, () =>
      acResistanceRoundWire(sv.wireLength, s.wire.diameter, fLoaded),
    );
    secondary = {
      inductance: sv.inductance,
      selfCapacitance: sv.selfCapacitance,
      resonantFrequency: resonantFrequencyLC(sv.inductance, sv.selfCapacitance),
      wireLength: sv.wireLength,
      windingLength: sv.windingLength,
      aspectRatio: sv.aspectRatio,
      dcResistance: sv.dcResistance,
      wireMass: sv.wireMass,
      windingDiameter: sv.windingDiameter,
      pitch: sv.pitch,
      inductanceSheet: sv.inductanceSheet,
      inductanceWheeler: sv.inductanceWheeler,
      selfCapacitanceInRange: sv.selfCapacitanceInRange,
      acResistance,
      q: acResistance === null ? null : qualityFactor(sv.inductance, acResistance, fLoaded),
    };
    system = {
      resonantFrequency: fLoaded,
      quarterWaveFrequency: quarterWaveFrequency(sv.wireLength),
      totalCapacitance,
      model: LUMPED_MODEL_NOTE,
    };
  }

  const p = design.primary;
  const pv = p ? attempt('The primary', 'primary', warnings, () => evaluatePrimary(p)) : null;
  const cv =
    p && pv && sv
      ? attempt('The coupling', 'primary', warnings, () => evaluateCoupling(p, s, pv.inductance, sv.inductance))
      : null;

  let tuning: TuningResult | null = null;
  const tank = design.tank ? evaluateTank(design.tank, design.supply) : null;
  if (p && pv && sv && tank && system) {
    const streamer = design.tuning.streamerCapacitance;
    const targetFrequency = resonantFrequencyLC(sv.inductance, system.totalCapacitance + streamer);
    const requiredInductance = inductanceForResonance(targetFrequency, tank.capacitance);
    const tap = attempt('The tap', 'primary.turns', warnings, () =>
      solveTap((t) => primaryInductanceAtTap(p, t), requiredInductance, minimumTap(p), p.turns),
    ) ?? { tapTurns: null, inRange: false };
    const primaryFrequencyAllTurns = resonantFrequencyLC(pv.inductance, tank.capacitance);
    tuning = {
      targetFrequency,
      tapTurns: tap.tapTurns,
      inRange: tap.inRange,
      streamerCapacitance: streamer,
      primaryFrequencyAllTurns,
      requiredInductance,
    };
    if (!tap.inRange) {
      const needMore = requiredInductance > pv.inductance;
      warnings.push(
        warning(
          'tap_out_of_range',
          needMore ? 'primary.turns' : 'tank',
          needMore
            ? `With every turn in circuit the primary and tank resonate at ${kHz(primaryFrequencyAllTurns)}, above the ` +
                `target ${kHz(targetFrequency)}: add primary turns or tank capacitance.`
            : `Even a quarter turn is too much inductance to reach ${kHz(targetFrequency)} with this tank: ` +
                'use less tank capacitance or a smaller primary.',
        ),
      );
    }
  }

  let primary: PrimaryResult | null = null;
  let coupling: CouplingResult | null = null;
  let response: ResponseResult | null = null;
  if (p && pv) {
    const tapTurns = tuning?.tapTurns ?? null;
    const inductanceAtTap = tapTurns === null ? null : primaryInductanceAtTap(p, tapTurns);
    primary = {
      inductance: pv.inductance,
      conductorLength: pv.conductorLength,
      outerDiameter: pv.outerDiameter,
      inductanceAtTap,
      conductorLengthAtTap: tapTurns === null ? null : primaryConductorLengthAtTap(p, tapTurns),
    };
    if (cv && sv) {
      const atTap =
        tapTurns !== null && inductanceAtTap !== null
          ? attempt('The coupling at the tap', 'primary', warnings, () => evaluateCoupling(p, s, inductanceAtTap, sv.inductance, tapTurns))
          : null;
      const target = design.tuning.targetCoupling;
      const elevation =
        target === null ? null : attempt('The elevation for the target coupling', 'tuning.targetCoupling', warnings, () => elevationForCoupling(design, target));
      if (target !== null && elevation === null) {
        warnings.push(
          warning('target_coupling_unreachable', 'tuning.targetCoupling', `No secondary elevation gives k = ${target} with this primary.`),
        );
      }
      coupling = {
        mutualInductance: cv.mutualInductance,
        k: cv.k,
        kAtTap: atTap?.k ?? null,
        mutualInductanceAtTap: atTap?.mutualInductance ?? null,
        elevationForTargetCoupling: elevation,
      };
      if (tuning && tuning.tapTurns !== null && atTap && inductanceAtTap !== null && tank) {
        const tuned = tuning;
        response = attempt('The coupled response', 'primary', warnings, () =>
          evaluateResponse({
            L1: inductanceAtTap,
            C1: tank.capacitance,
            L2: sv.inductance,
            C2: (system?.totalCapacitance ?? 0) + tuned.streamerCapacitance,
            k: atTap.k,
          }),
        );
      }
    }
  }

  const supply: SupplyResult | null = design.supply ? evaluateSupply(design.supply, tank?.capacitance ?? null) : null;

  let uncertainty: UncertaintyResult | null = null;
  if (sv && system) {
    uncertainty = attempt('The uncertainty band', 'secondary', warnings, () =>
      evaluateUncertainty(design, {
        inductance: sv.inductance,
        selfCapacitance: sv.selfCapacitance,
        toploadCapacitance: tl?.capacitance ?? 0,
        streamerCapacitance: design.tuning.streamerCapacitance,
        tankCapacitance: tank?.capacitance ?? null,
      }),
    );
  }

  const result: Result = {
    secondary,
    topload,
    system,
    primary,
    coupling,
    tuning,
    tank,
    supply,
    response,
    uncertainty,
    warnings,
  };
  warnings.push(...designWarnings(design, result));

  const clean: Result = { ...result, warnings };
  for (const key of ['secondary', 'topload', 'system', 'primary', 'coupling', 'tuning', 'tank', 'supply', 'response', 'uncertainty'] as const) {
    (clean as unknown as Record<string, unknown>)[key] = sanitizeNumbers(result[key], warnings, key);
  }
  return clean;
}

function kHz(f: number): string {
  return `${(f / 1000).toFixed(1)} kHz`;
}
