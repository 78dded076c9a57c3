import { inductancePrimary } from '../primary/inductance';
import { primaryConductorLength, primaryOuterDiameter, primaryRings, primaryRingsAtTap } from '../primary/geometry';
import { couplingCoefficient, mutualPrimarySecondary } from '../coupling/mutual';
import type { PrimarySI, SecondarySI } from '../types';
import { primaryParams, secondarySheet } from './geometry';

/** Inductance (ring model: Maxwell/Kirchhoff summation, F. W. Grover, Inductance Calculations, 1946, from memory), conductor length and outside diameter of the whole primary. */
export function evaluatePrimary(p: PrimarySI): { inductance: number; conductorLength: number; outerDiameter: number } {
  const params = primaryParams(p);
  return {
    inductance: inductancePrimary(params),
    conductorLength: primaryConductorLength(params),
    outerDiameter: primaryOuterDiameter(params),
  };
}

/** Primary inductance with `tapTurns` turns in circuit, counted from the inner end. */
export function primaryInductanceAtTap(p: PrimarySI, tapTurns: number): number {
  return inductancePrimary(primaryParams(p), tapTurns);
}

export function primaryConductorLengthAtTap(p: PrimarySI, tapTurns: number): number {
  return primaryConductorLength(primaryParams(p), tapTurns);
}

/**
 * Mutual inductance between the primary (all turns, or those up to a tap) and the secondary's current
 * sheet, and the coupling coefficient k = M/√(L1 L2) (mutual inductance of coaxial circles, J. C.
 * Maxwell, A Treatise on Electricity and Magnetism, 1873, vol. 2, art. 701).
 */
export function evaluateCoupling(
  p: PrimarySI,
  s: SecondarySI,
  primaryInductance: number,
  secondaryInductance: number,
  tapTurns?: number,
): { mutualInductance: number; k: number } {
  const params = primaryParams(p);
  const rings = tapTurns === undefined ? primaryRings(params) : primaryRingsAtTap(params, tapTurns);
  const mutualInductance = mutualPrimarySecondary(rings, secondarySheet(s));
  return { mutualInductance, k: couplingCoefficient(mutualInductance, primaryInductance, secondaryInductance) };
}

/** Smallest tap the solver considers: a quarter turn (or the whole primary if shorter). */
export function minimumTap(p: PrimarySI): number {
  return Math.min(0.25, p.turns);
}
