import type { z } from 'zod';
import type { calibrationBodySchema, StoredCalibration } from '../api/contracts/measurements';
import type { DesignSI, Result } from '../../solver';
import { inductanceForResonance, solveTap } from '../../solver/tuning/tap';
import { minimumTap, primaryInductanceAtTap } from '../../solver/system/primary';

/** Measured values a builder adopted in place of the predictions: the request body and the stored form. */
export type CalibrationInput = z.output<typeof calibrationBodySchema>;
export type Calibration = StoredCalibration;

/** Merges an update into stored calibration: a number sets, null clears, absent keeps. */
export function mergeCalibration(stored: Calibration, update: CalibrationInput): Calibration {
  const out: Calibration = { ...stored };
  for (const key of ['loadedFrequency', 'tankCapacitance', 'coupling'] as const) {
    const v = update[key];
    if (v === null) delete out[key];
    else if (v !== undefined) out[key] = v;
  }
  return out;
}

/** Reads whatever JSON the database holds into a Calibration, dropping anything that is not a finite positive number. */
export function readCalibration(raw: unknown): Calibration {
  const out: Calibration = {};
  if (!raw || typeof raw !== 'object') return out;
  const r = raw as Record<string, unknown>;
  for (const key of ['loadedFrequency', 'tankCapacitance', 'coupling'] as const) {
    const v = r[key];
    if (typeof v === 'number' && Number.isFinite(v) && v > 0) out[key] = v;
  }
  return out;
}

export interface CalibratedTuning {
  /** the frequency the tap aims at: the adopted loaded frequency lowered by the design's streamer allowance */
  targetFrequency: number;
  tankCapacitance: number;
  requiredInductance: number;
  tapTurns: number | null;
  inRange: boolean;
}

/**
 * The tap that tunes the primary to an adopted (measured) loaded frequency and/or tank capacitance.
 * The streamer allowance keeps the design's ratio target/loaded, which in the lumped model is
 * √(C_total / (C_total + C_streamer)) and does not depend on the inductance. Then, as the solver does,
 * L_required = 1/((2π f)² C) and the tap solves L1(tap) = L_required (tuning/tap.ts). Null when the
 * design has no primary or tank, or nothing was adopted that moves the tap.
 */
export function calibratedTuning(design: DesignSI, result: Result, calibration: Calibration): CalibratedTuning | null {
  const p = design.primary;
  if (!p || !result.tuning || !result.system || !result.tank) return null;
  if (calibration.loadedFrequency === undefined && calibration.tankCapacitance === undefined) return null;
  const ratio = result.tuning.targetFrequency / result.system.resonantFrequency;
  const targetFrequency = (calibration.loadedFrequency ?? result.system.resonantFrequency) * ratio;
  const tankCapacitance = calibration.tankCapacitance ?? result.tank.capacitance;
  const requiredInductance = inductanceForResonance(targetFrequency, tankCapacitance);
  const tap = solveTap((t) => primaryInductanceAtTap(p, t), requiredInductance, minimumTap(p), p.turns);
  return { targetFrequency, tankCapacitance, requiredInductance, tapTurns: tap.tapTurns, inRange: tap.inRange };
}
