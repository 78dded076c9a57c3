import { toploadCapacitance } from '../topload/bem';
import { capacitanceSphereOverPlane } from '../topload/sphere';
import { capacitanceToroidEmpirical } from '../topload/torus';
import type { DesignSI, ToploadSI } from '../types';
import { toploadCentreHeight } from './geometry';

/** Capacitance of the topload alone to the ground plane: a toroid by the BEM with a ground image, a sphere by the exact
 * image series (W. R. Smythe, Static and Dynamic Electricity, 3rd ed., 1968, ch. 5, from memory), which stays exact close
 * to the ground where the BEM degrades. The winding is not included: the field model (field/model.ts) solves both
 * together, and the coil then takes capacitance away from the topload by shielding it. */
export function evaluateTopload(d: DesignSI, t: ToploadSI): { capacitance: number; centreHeightAboveGround: number; empirical: number | null } {
  const h = toploadCentreHeight(d, t);
  const capacitance =
    t.shape === 'toroid'
      ? toploadCapacitance({ shape: 'toroid', majorDiameter: t.majorDiameter, minorDiameter: t.minorDiameter, centreHeightAboveGround: h })
      : capacitanceSphereOverPlane(t.diameter / 2, h);
  const empirical = t.shape === 'toroid' ? capacitanceToroidEmpirical(t.majorDiameter, t.minorDiameter) : null;
  return { capacitance, centreHeightAboveGround: h, empirical };
}
