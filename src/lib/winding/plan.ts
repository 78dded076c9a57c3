import type { DesignSI, Result } from '../../solver';

/** Where the pitch of a session comes from. */
export type PitchSource = 'insulated-diameter' | 'design-spacing';

/**
 * What a winding session winds, taken from the design and its result when the session starts, so readings
 * keep their meaning if the design changes later.
 */
export interface WindingPlan {
  turns: number;
  /** axial advance per turn, m: the solver's winding length / turns (the build sheet's pitch) */
  pitch: number;
  /** close-wound (no winding length given: pitch = insulated diameter) or spaced by the design's winding length */
  pitchSource: PitchSource;
  /** diameter at the wire centres, m */
  windingDiameter: number;
  insulatedDiameter: number;
  /** planned winding length, m */
  windingLength: number;
  /** computed wire for the whole winding, m (the solver's helix length, leads excluded) */
  wireLength: number;
}

/**
 * The plan of a solved design. The pitch is the solver's (winding length / turns): the insulated wire diameter
 * when the design is close-wound, otherwise the spacing the design's winding length sets.
 */
export function windingPlan(design: DesignSI, result: Result): WindingPlan | null {
  const sec = result.secondary;
  if (!sec) return null;
  const s = design.secondary;
  return {
    turns: s.turns,
    pitch: sec.windingLength / s.turns,
    pitchSource: s.windingLength === null ? 'insulated-diameter' : 'design-spacing',
    windingDiameter: sec.windingDiameter,
    insulatedDiameter: s.wire.insulatedDiameter,
    windingLength: sec.windingLength,
    wireLength: sec.wireLength,
  };
}
