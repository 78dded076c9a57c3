import type { FormerSI } from '../types';
import { inductanceSolenoidLorenz } from '../secondary/inductance';
import { formerChargeFactor } from './former';
import { ladderModes, sectionInductanceMatrix } from './ladder';
import { FIELD_DISCRETISATION } from './model';
import { structureCapacitance } from './structure';

/**
 * Self-capacitance of an isolated single-layer coil (base grounded, far from everything else) by the field
 * model, measured the way R. G. Medhurst measured it (Wireless Engineer 24, 1947): capacitors added from the top
 * to ground shift the first mode, 1/ω² is a straight line in the added capacitance, and its intercept over its
 * slope is the self-capacitance. Two added values (5× and 10× a rough guess) give the line. In F.
 * Domain: diameter > 0, length > 0 (wire-centre diameter and winding length).
 * @example isolatedSelfCapacitance(0.1, 0.3, { material: 'polystyrene', permittivity: 2.55, wallThickness: 0.05, assumed: false })
 */
export function isolatedSelfCapacitance(diameter: number, length: number, former: FormerSI, sections = FIELD_DISCRETISATION.sections): number {
  const r = diameter / 2;
  const factor = formerChargeFactor(former, r, diameter / length);
  const disc = { ...FIELD_DISCRETISATION, sections, windingPanels: 4 * sections };
  const sc = structureCapacitance({ winding: { radius: r, zBottom: 0, length }, topload: null, rings: [], ground: false }, disc, factor);
  const turns = 500;
  const L = sectionInductanceMatrix(turns, r, length, sections, inductanceSolenoidLorenz(turns, r, length));
  const guess = 5e-11 * (diameter + length);
  const c1 = 5 * guess;
  const c2 = 10 * guess;
  const y1 = 1 / ladderModes(L, sc.matrix, sections, c1, 1).omega2[0];
  const y2 = 1 / ladderModes(L, sc.matrix, sections, c2, 1).omega2[0];
  const slope = (y2 - y1) / (c2 - c1);
  return y1 / slope - c1;
}
