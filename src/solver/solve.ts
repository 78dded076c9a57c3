import { resonantFrequencyLC, quarterWaveFrequency, qualityFactor } from './secondary/resonance';
import { acResistanceRoundWire } from './wire/resistance';
import type {
  CouplingResult,
  DesignSI,
  DriveResult,
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
import { evaluateFieldModel, FIELD_MODEL_NOTE } from './field/model';
import { DEFAULT_FORMER } from './field/former';
import { evaluateDrive } from './system/drive';

export const LUMPED_MODEL_NOTE =
  'Lumped model: the secondary is its low-frequency inductance resonating with its Medhurst self-capacitance ' +
  'plus the topload capacitance computed alone, in parallel; the shielding between coil and topload and ' +
  'distributed (transmission-line) effects are left out.';

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

  const field = sv ? attempt('The field model', 'secondary', warnings, () => evaluateFieldModel(design, sv.inductance)) : null;
  if (sv) {
    const totalCapacitance = sv.selfCapacitance + (tl?.capacitance ?? 0);
    const fLumped = resonantFrequencyLC(sv.inductance, totalCapacitance);
    const fLoaded = field ? field.modes[0] : fLumped;
    const acResistance = attempt('The AC resistance', 'secondary.wire', warnings, () =>
      acResistanceRoundWire(sv.wireLength, s.wire.diameter, fLoaded),
    );
    secondary = {
      inductance: sv.inductance,
      selfCapacitance: sv.selfCapacitance,
      resonantFrequency: field ? field.unloadedFrequency : resonantFrequencyLC(sv.inductance, sv.selfCapacitance),
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
      lumpedResonantFrequency: fLumped,
      quarterWaveFrequency: quarterWaveFrequency(sv.wireLength),
      totalCapacitance,
      effectiveInductance: field ? field.effectiveInductance : sv.inductance,
      effectiveCapacitance: field ? field.effectiveCapacitance : totalCapacitance,
      modes: field ? field.modes : [fLumped],
      voltageProfile: field ? field.voltageProfile : [],
      currentProfile: field ? field.currentProfile : [],
      fieldCapacitance: field ? field.fieldCapacitance : { structure: totalCapacitance, coilAlone: sv.selfCapacitance, toploadAlone: tl?.capacitance ?? 0, interaction: 0 },
      former: field ? field.former : DEFAULT_FORMER,
      model: field ? FIELD_MODEL_NOTE : LUMPED_MODEL_NOTE,
    };
    if (secondary.q !== null && secondary.q < 1) {
      warnings.push(
        warning(
          'q_below_one',
          'secondary.wire',
          `The secondary's Q at ${kHz(fLoaded)} is ${secondary.q.toPrecision(2)}, below 1: the winding's resistance swamps its ` +
            'reactance, so it does not resonate; the coupled response is withheld. Use thicker wire or fewer turns.',
        ),
      );
    }
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
    const targetFrequency = field ? field.frequencyWithTopCapacitance(streamer) : resonantFrequencyLC(sv.inductance, system.totalCapacitance + streamer);
    // a dual-resonant bridge coil tunes its primary to a ratio of the secondary (CONTRACT datums)
    const primaryTargetFrequency = targetFrequency * tapRatio(design);
    const requiredInductance = inductanceForResonance(primaryTargetFrequency, tank.capacitance);
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
      primaryTargetFrequency,
    };
    if (!tap.inRange) {
      const needMore = requiredInductance > pv.inductance;
      warnings.push(
        warning(
          'tap_out_of_range',
          needMore ? 'primary.turns' : 'tank',
          needMore
            ? `With every turn in circuit the primary and tank resonate at ${kHz(primaryFrequencyAllTurns)}, above the ` +
                `target ${kHz(primaryTargetFrequency)}: add primary turns or tank capacitance.`
            : `Even a quarter turn is too much inductance to reach ${kHz(primaryTargetFrequency)} with this tank: ` +
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
      const resonates = secondary?.q === null || secondary?.q === undefined || secondary.q >= 1;
      if (tuning && tuning.tapTurns !== null && atTap && inductanceAtTap !== null && tank && resonates) {
        const tuned = tuning;
        const pair = field
          ? field.withTopCapacitance(tuned.streamerCapacitance)
          : { effectiveInductance: sv.inductance, effectiveCapacitance: (system?.totalCapacitance ?? 0) + tuned.streamerCapacitance };
        response = attempt('The coupled response', 'primary', warnings, () =>
          evaluateResponse({
            L1: inductanceAtTap,
            C1: tank.capacitance,
            L2: pair.effectiveInductance,
            C2: pair.effectiveCapacitance,
            k: atTap.k,
          }),
        );
      }
    }
  }

  const supply: SupplyResult | null = design.supply ? evaluateSupply(design.supply, tank?.capacitance ?? null) : null;

  let drive: DriveResult | null = null;
  const ss = design.supply?.kind === 'solid-state' ? design.supply : null;
  if (ss && p && pv && cv && sv && system && secondary) {
    const dual = ss.topology === 'dual-resonant';
    const streamer = design.tuning.streamerCapacitance;
    const pair = field
      ? field.withTopCapacitance(streamer)
      : { effectiveInductance: sv.inductance, effectiveCapacitance: system.totalCapacitance + streamer };
    const L1 = dual ? primary?.inductanceAtTap ?? null : pv.inductance;
    const M = dual ? coupling?.mutualInductanceAtTap ?? null : cv.mutualInductance;
    const length = dual ? primary?.conductorLengthAtTap ?? null : pv.conductorLength;
    const C1 = dual ? tank?.capacitance ?? null : null;
    const target = tuning?.targetFrequency ?? resonantFrequencyLC(pair.effectiveInductance, pair.effectiveCapacitance);
    if (L1 !== null && M !== null && length !== null && (!dual || C1 !== null)) {
      const fDrive = C1 !== null ? resonantFrequencyLC(L1, C1) : target;
      drive = attempt('The burst', 'supply', warnings, () =>
        evaluateDrive(
          ss,
          {
            L1,
            C1,
            R1: acResistanceRoundWire(length, p.conductorDiameter, fDrive),
            L2: pair.effectiveInductance,
            C2: pair.effectiveCapacitance,
            R2: secondary!.acResistance ?? secondary!.dcResistance,
            M,
          },
          dual ? design.tank : null,
          target,
        ),
      );
    }
  }

  let uncertainty: UncertaintyResult | null = null;
  if (sv && system) {
    uncertainty = attempt('The uncertainty band', 'secondary', warnings, () =>
      evaluateUncertainty(design, {
        inductance: sv.inductance,
        selfCapacitance: sv.selfCapacitance,
        toploadCapacitance: tl?.capacitance ?? 0,
        streamerCapacitance: design.tuning.streamerCapacitance,
        tankCapacitance: tank?.capacitance ?? null,
        tapFrequencyRatio: tapRatio(design),
        field: field
          ? {
              ...field.withTopCapacitance(design.tuning.streamerCapacitance),
              windingCapacitance: field.fieldCapacitance.coilAlone,
              frequencyWithTopCapacitance: field.frequencyWithTopCapacitance,
            }
          : undefined,
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
    drive,
    warnings,
  };
  warnings.push(...designWarnings(design, result));

  const clean: Result = { ...result, warnings };
  for (const key of ['secondary', 'topload', 'system', 'primary', 'coupling', 'tuning', 'tank', 'supply', 'response', 'uncertainty', 'drive'] as const) {
    (clean as unknown as Record<string, unknown>)[key] = sanitizeNumbers(result[key], warnings, key);
  }
  return clean;
}

/** The tap's frequency over the tuning target: the supply's tuning ratio for a dual-resonant bridge, otherwise 1. */
export function tapRatio(design: DesignSI): number {
  const u = design.supply;
  return u?.kind === 'solid-state' && u.topology === 'dual-resonant' ? u.tuningRatio : 1;
}

function kHz(f: number): string {
  return `${(f / 1000).toFixed(1)} kHz`;
}
