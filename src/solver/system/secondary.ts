import { inductanceSecondary, inductanceSolenoidLorenz, inductanceSolenoidWheeler1928 } from '../secondary/inductance';
import { selfCapacitanceMedhurst } from '../secondary/capacitance';
import { helixWireLength } from '../wire/length';
import { copperResistance } from '../wire/resistance';
import { copperMass } from '../wire/mass';
import type { SecondarySI } from '../types';
import { windingDiameter, windingLength } from './geometry';

export interface SecondaryValues {
  inductance: number;
  inductanceSheet: number;
  inductanceWheeler: number;
  selfCapacitance: number;
  selfCapacitanceInRange: boolean;
  wireLength: number;
  windingLength: number;
  windingDiameter: number;
  aspectRatio: number;
  pitch: number;
  dcResistance: number;
  wireMass: number;
}

/**
 * Geometry, inductance and self-capacitance of the secondary. Inductance: Lorenz current sheet at
 * the wire centres (L. Lorenz, Ann. Phys. Chem. 7, 1879; H. Nagaoka 1909; both from memory) with Rosa's
 * round-wire corrections (E. B. Rosa, Bull. Bur. Stand. 2(2), 1906; F. W. Grover, Inductance Calculations,
 * 1946; both from memory) while the pitch is small against the radius, an explicit ring sum beyond; self-capacitance: R. G. Medhurst, Wireless Engineer 24, 1947 (table). The wire is copper.
 */
export function evaluateSecondary(s: SecondarySI): SecondaryValues {
  const D = windingDiameter(s);
  const r = D / 2;
  const len = windingLength(s);
  const wireLength = helixWireLength(s.turns, D, len);
  const c = selfCapacitanceMedhurst(D, len);
  return {
    inductance: inductanceSecondary(s.turns, r, len, s.wire.diameter).inductance,
    inductanceSheet: inductanceSolenoidLorenz(s.turns, r, len),
    inductanceWheeler: inductanceSolenoidWheeler1928(s.turns, r, len),
    selfCapacitance: c.capacitance,
    selfCapacitanceInRange: c.inRange,
    wireLength,
    windingLength: len,
    windingDiameter: D,
    aspectRatio: len / D,
    pitch: len / s.turns,
    dcResistance: copperResistance(wireLength, s.wire.diameter),
    wireMass: copperMass(wireLength, s.wire.diameter),
  };
}
