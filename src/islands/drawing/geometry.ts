import type { DesignSI } from '~/solver';

/** A conductor seen end-on where it crosses the drawing plane (r may be negative: the left side). */
export interface Crossing {
  r: number;
  z: number;
  radius: number;
  /** turns from the inner end at this crossing */
  turn: number;
}

export interface CoilSection {
  /** winding: a band at |r| = windingRadius from zBottom to zTop */
  windingRadius: number;
  formRadius: number;
  wireRadius: number;
  zBottom: number;
  zTop: number;
  /** the form extends a little beyond the winding, as built */
  formBottom: number;
  formTop: number;
  topload:
    | { shape: 'toroid'; ringRadius: number; tubeRadius: number; zCentre: number; outerRadius: number }
    | { shape: 'sphere'; radius: number; zCentre: number; outerRadius: number }
    | null;
  primary: { crossings: Crossing[]; outerRadius: number; topZ: number } | null;
  groundZ: number;
  /** bounding box in metres */
  box: { rMax: number; zMin: number; zMax: number };
}

function stepPerTurn(p: NonNullable<DesignSI['primary']>): { dr: number; dz: number } {
  const pitch = p.conductorDiameter + p.spacing;
  if (p.shape === 'flat') return { dr: pitch, dz: 0 };
  if (p.shape === 'helical') return { dr: 0, dz: pitch };
  const a = p.angle ?? 0;
  return { dr: pitch * Math.cos(a), dz: pitch * Math.sin(a) };
}

/**
 * The side cross-section through the coil's axis, in metres, z up from the primary reference plane.
 * A spiral or helix crosses the plane once per turn on each side, half a turn apart, which is what a
 * saw cut through the real coil would show.
 */
export function coilSection(d: DesignSI): CoilSection {
  const s = d.secondary;
  const wireRadius = s.wire.insulatedDiameter / 2;
  const formRadius = s.formDiameter / 2;
  const windingRadius = formRadius + wireRadius;
  const length = s.windingLength ?? s.turns * s.wire.insulatedDiameter;
  const zBottom = s.elevation;
  const zTop = s.elevation + length;
  const margin = Math.min(0.04, 0.1 * length);

  let topload: CoilSection['topload'] = null;
  if (d.topload) {
    const zCentre = zTop + d.topload.elevation;
    if (d.topload.shape === 'toroid') {
      const tubeRadius = d.topload.minorDiameter / 2;
      topload = { shape: 'toroid', tubeRadius, ringRadius: d.topload.majorDiameter / 2 - tubeRadius, zCentre, outerRadius: d.topload.majorDiameter / 2 };
    } else {
      topload = { shape: 'sphere', radius: d.topload.diameter / 2, zCentre, outerRadius: d.topload.diameter / 2 };
    }
  }

  let primary: CoilSection['primary'] = null;
  if (d.primary) {
    const p = d.primary;
    const { dr, dz } = stepPerTurn(p);
    const crossings: Crossing[] = [];
    for (let half = 0; half <= Math.floor(2 * p.turns + 1e-9); half++) {
      const turn = half / 2;
      const side = half % 2 === 0 ? 1 : -1;
      crossings.push({ r: side * (p.innerDiameter / 2 + turn * dr), z: p.elevation + turn * dz, radius: p.conductorDiameter / 2, turn });
    }
    const last = crossings[crossings.length - 1];
    primary = {
      crossings,
      outerRadius: Math.max(...crossings.map((c) => Math.abs(c.r))) + p.conductorDiameter / 2,
      topZ: (last?.z ?? p.elevation) + p.conductorDiameter / 2,
    };
  }

  const groundZ = -d.groundClearance;
  const rMax = Math.max(windingRadius + wireRadius, topload?.outerRadius ?? 0, primary?.outerRadius ?? 0);
  const zMax = Math.max(zTop + margin, topload ? topload.zCentre + (topload.shape === 'toroid' ? topload.tubeRadius : topload.radius) : -Infinity, primary?.topZ ?? -Infinity);
  const zMin = Math.min(groundZ, zBottom - margin);
  return {
    windingRadius,
    formRadius,
    wireRadius,
    zBottom,
    zTop,
    formBottom: zBottom - margin,
    formTop: zTop + margin,
    topload,
    primary,
    groundZ,
    box: { rMax, zMin, zMax },
  };
}
