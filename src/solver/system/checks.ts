import { primaryRings } from '../primary/geometry';
import type { DesignIssue, DesignSI } from '../types';
import { closeWoundLength, primaryParams, toploadCentreHeight, toploadHalfHeight, windingDiameter, windingLength } from './geometry';

const mm = (x: number): string =>
  Math.abs(x) < 1 ? `${Number((x * 1000).toFixed(Math.abs(x) < 0.01 ? 3 : 1))} mm` : `${Number(x.toFixed(3))} m`;
// allow rounding in unit conversions ("23 in" against 1000 × 0.584 mm)
const SLACK = 1e-9;

/**
 * Checks across fields that make a design impossible to build or to compute: the parser reports them
 * as validation issues, the sweep and inverse helpers skip such points. Each names the field to change.
 */
export function checkDesign(d: DesignSI): DesignIssue[] {
  const issues: DesignIssue[] = [];
  const s = d.secondary;
  const w = s.wire;

  if (w.insulatedDiameter < w.diameter * (1 - SLACK)) {
    issues.push({
      path: 'secondary.wire.insulatedDiameter',
      message: `the insulated diameter (${mm(w.insulatedDiameter)}) is smaller than the bare diameter (${mm(w.diameter)})`,
    });
    return issues;
  }
  if (s.windingLength !== null && closeWoundLength(s) > s.windingLength * (1 + SLACK)) {
    issues.push({
      path: 'secondary.windingLength',
      message:
        `${s.turns} turns of ${mm(w.insulatedDiameter)} insulated wire need at least ${mm(closeWoundLength(s))} ` +
        `of winding; ${mm(s.windingLength)} is too short (lengthen the winding or use fewer turns or thinner wire)`,
    });
  }
  if (s.elevation < -d.groundClearance) {
    issues.push({ path: 'secondary.elevation', message: 'the bottom of the winding would be below the ground plane' });
  }

  const len = windingLength(s);
  const rw = windingDiameter(s) / 2;
  const t = d.topload;
  if (t) {
    if (t.shape === 'toroid' && t.minorDiameter >= t.majorDiameter / 2) {
      issues.push({
        path: 'topload.minorDiameter',
        message: 'the tube diameter must be less than half the overall diameter, or the ring closes on itself',
      });
    } else {
      const h = toploadCentreHeight(d, t);
      if (h - toploadHalfHeight(t) <= 0) {
        issues.push({ path: 'topload.elevation', message: 'the topload would reach down to the ground plane' });
      }
      // lowest point the topload's surface reaches at the winding's radius, relative to its centre
      let reach = 0;
      if (t.shape === 'toroid') {
        const r = t.minorDiameter / 2;
        const R = t.majorDiameter / 2 - r;
        const dx = Math.abs(rw - R);
        reach = dx < r ? Math.sqrt(r * r - dx * dx) : -Infinity;
      } else {
        const a = t.diameter / 2;
        reach = rw < a ? Math.sqrt(a * a - rw * rw) : 0;
      }
      if (t.elevation < reach * (1 - SLACK)) {
        issues.push({
          path: 'topload.elevation',
          message: `the topload would cut into the top of the winding; its centre must be at least ${mm(reach)} above it`,
        });
      }
    }
  }

  const p = d.primary;
  if (p) {
    if (p.shape === 'conical' && p.angle === null) {
      issues.push({ path: 'primary.angle', message: 'a conical primary needs its angle, such as "30 deg"' });
      return issues;
    }
    if (p.innerDiameter <= p.conductorDiameter) {
      issues.push({
        path: 'primary.innerDiameter',
        message: `the inner turn's centre-line diameter (${mm(p.innerDiameter)}) must exceed the conductor diameter (${mm(p.conductorDiameter)})`,
      });
      return issues;
    }
    const rings = primaryRings(primaryParams(p));
    const a = p.conductorDiameter / 2;
    const wireR = w.insulatedDiameter / 2;
    const zLo = s.elevation - a - wireR;
    const zHi = s.elevation + len + a + wireR;
    const hit = rings.findIndex((ring) => ring.r - a < rw + wireR && ring.z > zLo && ring.z < zHi);
    if (hit >= 0) {
      issues.push({
        path: hit === 0 ? 'primary.innerDiameter' : 'primary',
        message:
          `primary turn ${hit + 1} (centre-line diameter ${mm(2 * rings[hit].r)}, height ${mm(rings[hit].z)}) would run through ` +
          `the secondary winding (diameter ${mm(2 * rw)} from ${mm(s.elevation)} to ${mm(s.elevation + len)}); ` +
          'widen the primary or raise the secondary',
      });
    }
    if (rings.some((ring) => ring.z < -d.groundClearance)) {
      issues.push({ path: 'primary.elevation', message: 'part of the primary would be below the ground plane' });
    }
  }
  const rail = d.strikeRail;
  if (rail) {
    if (rail.height - rail.conductorDiameter / 2 <= -d.groundClearance) {
      issues.push({ path: 'strikeRail.height', message: 'the strike rail would touch or sit below the ground plane' });
    }
    if (rail.diameter - rail.conductorDiameter <= windingDiameter(s) + w.insulatedDiameter) {
      issues.push({ path: 'strikeRail.diameter', message: `the strike rail must be wider than the secondary winding (${mm(windingDiameter(s))})` });
    }
  }
  return issues;
}
