import { toploadCapacitance } from '../topload/bem';
import { capacitanceToroidEmpirical } from '../topload/torus';
import type { DesignSI, ToploadSI } from '../types';
import { toploadCentreHeight } from './geometry';

/** Capacitance of the topload to the ground plane (BEM with a ground image; checked against W. R. Smythe, Static and
 * Dynamic Electricity, 3rd ed., 1968, from memory). */
export function evaluateTopload(d: DesignSI, t: ToploadSI): { capacitance: number; centreHeightAboveGround: number; empirical: number | null } {
  const h = toploadCentreHeight(d, t);
  const capacitance =
    t.shape === 'toroid'
      ? toploadCapacitance({ shape: 'toroid', majorDiameter: t.majorDiameter, minorDiameter: t.minorDiameter, centreHeightAboveGround: h })
      : toploadCapacitance({ shape: 'sphere', diameter: t.diameter, centreHeightAboveGround: h });
  const empirical = t.shape === 'toroid' ? capacitanceToroidEmpirical(t.majorDiameter, t.minorDiameter) : null;
  return { capacitance, centreHeightAboveGround: h, empirical };
}
