import type { DesignSI, PrimarySI, SecondarySI, ToploadSI } from '../types';

/** Winding diameter at the wire centres: form diameter plus one insulated wire diameter. */
export function windingDiameter(s: SecondarySI): number {
  return s.formDiameter + s.wire.insulatedDiameter;
}

/** Close-wound length (turns × insulated diameter) when the design gives none. */
export function closeWoundLength(s: SecondarySI): number {
  return s.turns * s.wire.insulatedDiameter;
}

export function windingLength(s: SecondarySI): number {
  return s.windingLength ?? closeWoundLength(s);
}

/** Height of the topload's centre above the ground plane. */
export function toploadCentreHeight(d: DesignSI, t: ToploadSI): number {
  return d.groundClearance + d.secondary.elevation + windingLength(d.secondary) + t.elevation;
}

/** Outside radius of the topload in the horizontal plane. */
export function toploadOuterRadius(t: ToploadSI): number {
  return t.shape === 'toroid' ? t.majorDiameter / 2 : t.diameter / 2;
}

/** Half-height of the topload's body (the tube radius of a toroid, the radius of a sphere). */
export function toploadHalfHeight(t: ToploadSI): number {
  return t.shape === 'toroid' ? t.minorDiameter / 2 : t.diameter / 2;
}

/** The secondary as the current sheet the coupling model expects, in the primary frame. */
export function secondarySheet(s: SecondarySI): { radius: number; z0: number; length: number; turns: number } {
  return { radius: windingDiameter(s) / 2, z0: s.elevation, length: windingLength(s), turns: s.turns };
}

/** The primary in the form the geometry and inductance primitives take. */
export interface PrimaryParams {
  shape: PrimarySI['shape'];
  innerDiameter: number;
  turns: number;
  conductorDiameter: number;
  spacing: number;
  angle?: number;
  elevation: number;
}

export function primaryParams(p: PrimarySI): PrimaryParams {
  const base: PrimaryParams = {
    shape: p.shape,
    innerDiameter: p.innerDiameter,
    turns: p.turns,
    conductorDiameter: p.conductorDiameter,
    spacing: p.spacing,
    elevation: p.elevation,
  };
  if (p.shape === 'conical' && p.angle !== null) base.angle = p.angle;
  return base;
}
