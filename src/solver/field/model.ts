import { primaryRings } from '../primary/geometry';
import type { AxisymmetricShape } from '../topload/bem';
import type { DesignSI, FieldCapacitanceResult, FormerSI } from '../types';
import { primaryParams, toploadCentreHeight, windingDiameter, windingLength } from '../system/geometry';
import { DEFAULT_FORMER, formerChargeFactor } from './former';
import { ladderModes, sectionInductanceMatrix, type LadderModes } from './ladder';
import { quadraticForm, structureCapacitance, type StructureDiscretisation, type StructureGeometry } from './structure';

/** Default discretisation: doubling every count changes the loaded frequency by less than 1e-3 (asserted in the tests). */
export const FIELD_DISCRETISATION: Readonly<StructureDiscretisation> = { sections: 20, windingPanels: 64, toploadPanels: 20 };

/**
 * Stated accuracy of the field model's effective capacitance for the structure as modelled, relative: ±2 %. The
 * electrostatics are converged far below that (doubling every count changes the frequency by < 1e-3, and an
 * independent scipy solve agrees within 1e-4); what remains is the idealisation: a smooth sheet for the winding,
 * an infinite ground plane and nothing else in the room (judgement, from memory of the spread whole-structure
 * field solvers show on topload-dominated coils).
 */
export const FIELD_MODEL_ACCURACY = 0.02;

/**
 * Stated accuracy of the winding's own share (its capacitance alone in the same surroundings), relative: ±30 %.
 * The field model is quasi-static; against R. G. Medhurst's measured table (Wireless Engineer 24, 1947) with the
 * former matched to his polystyrene rods it runs from +26 % at ℓ/D = 1 to −11 % at ℓ/D = 5 (asserted in the
 * tests and listed on the validation page): it does not reproduce the rise of self-capacitance with length that
 * D. W. Knight (2013) ties to the wave along the helix. The band carries that spread on the winding's share.
 */
export const FIELD_WINDING_ACCURACY = 0.3;

export const FIELD_MODEL_NOTE =
  'Field model: the winding (a sheet whose voltage rises from the grounded base to the top), the topload, the ground ' +
  'plane, the grounded primary and any strike rail are solved together for their capacitances, and the winding is cut ' +
  'into sections with their mutual inductances; the first mode of that ladder is the loaded frequency. The topload and ' +
  'the winding shield each other, so together they hold less capacitance than the sum of the parts alone.';

export interface FieldModel {
  modes: number[];
  /** first mode of the winding alone (no topload) in the same surroundings */
  unloadedFrequency: number;
  effectiveInductance: number;
  effectiveCapacitance: number;
  voltageProfile: Array<{ height: number; voltage: number }>;
  currentProfile: Array<{ height: number; current: number }>;
  fieldCapacitance: FieldCapacitanceResult;
  former: FormerSI;
  /** first-mode frequency with an extra capacitance from the top to ground (same geometry, cached matrices) */
  frequencyWithTopCapacitance: (extra: number) => number;
  /** the equivalent pair at the top with an extra top capacitance */
  withTopCapacitance: (extra: number) => { frequency: number; effectiveInductance: number; effectiveCapacitance: number };
}

interface Prepared {
  L: Float64Array;
  C: Float64Array;
  unloadedFrequency: number;
  sections: number;
  nodeHeights: Float64Array;
  fieldCapacitance: FieldCapacitanceResult;
  former: FormerSI;
  modes: Map<number, LadderModes>;
}

const MEMO_LIMIT = 64;
const memo = new Map<string, Prepared>();

/**
 * The whole-structure field model of a design's secondary. `inductance` is the secondary's own low-frequency
 * inductance (the ladder's matrix is made to sum to it). Memoised per geometry (a bounded map keyed on the
 * geometric inputs only), so a change of tank, supply or streamer allowance reuses the capacitance and
 * inductance matrices and costs one small eigenproblem.
 */
export function evaluateFieldModel(d: DesignSI, inductance: number, disc: StructureDiscretisation = FIELD_DISCRETISATION): FieldModel {
  const geometry = fieldGeometry(d);
  const former = d.secondary.former ?? DEFAULT_FORMER;
  const key = JSON.stringify([geometry, former.permittivity, former.wallThickness, d.secondary.formDiameter, d.secondary.turns, inductance, disc]);
  let prepared = memo.get(key);
  if (!prepared) {
    prepared = prepare(d, geometry, former, inductance, disc);
    if (memo.size >= MEMO_LIMIT) memo.delete(memo.keys().next().value as string);
    memo.set(key, prepared);
  }
  const p = prepared;
  const modesFor = (extra: number): LadderModes => {
    let m = p.modes.get(extra);
    if (!m) {
      m = ladderModes(p.L, p.C, p.sections, extra);
      if (p.modes.size > 16) p.modes.delete(p.modes.keys().next().value as number);
      p.modes.set(extra, m);
    }
    return m;
  };
  const base = modesFor(0);
  const toFrequency = (w2: number) => Math.sqrt(w2) / (2 * Math.PI);
  const ground = d.groundClearance;
  const voltageProfile = [{ height: p.nodeHeights[0] - ground, voltage: 0 }];
  base.voltage.forEach((v, k) => voltageProfile.push({ height: p.nodeHeights[k + 1] - ground, voltage: v }));
  const currentProfile = Array.from(base.current, (c, k) => ({ height: 0.5 * (p.nodeHeights[k] + p.nodeHeights[k + 1]) - ground, current: c }));
  return {
    modes: base.omega2.map(toFrequency),
    unloadedFrequency: p.unloadedFrequency,
    effectiveInductance: base.effectiveInductance,
    effectiveCapacitance: base.effectiveCapacitance,
    voltageProfile,
    currentProfile,
    fieldCapacitance: p.fieldCapacitance,
    former: p.former,
    frequencyWithTopCapacitance: (extra) => toFrequency(modesFor(extra).omega2[0]),
    withTopCapacitance: (extra) => {
      const m = modesFor(extra);
      return { frequency: toFrequency(m.omega2[0]), effectiveInductance: m.effectiveInductance, effectiveCapacitance: m.effectiveCapacitance };
    },
  };
}

function prepare(d: DesignSI, g: StructureGeometry, former: FormerSI, inductance: number, disc: StructureDiscretisation): Prepared {
  const D = windingDiameter(d.secondary);
  const len = windingLength(d.secondary);
  const factor = formerChargeFactor(former, d.secondary.formDiameter / 2, D / len);
  const sc = structureCapacitance(g, disc, factor);
  const N = disc.sections;
  const linear = Array.from({ length: N }, (_, k) => (k + 1) / N);
  const structure = quadraticForm(sc.matrix, linear);
  const coilAlone = quadraticForm(sc.coilAlone, linear);
  const fieldCapacitance: FieldCapacitanceResult = {
    structure,
    coilAlone,
    toploadAlone: sc.toploadAlone,
    interaction: structure - coilAlone - sc.toploadAlone,
  };
  const L = sectionInductanceMatrix(d.secondary.turns, D / 2, len, N, inductance);
  const unloaded = sc.coilAlone === sc.matrix ? null : ladderModes(L, sc.coilAlone, N, 0, 1);
  const modes = new Map<number, LadderModes>();
  const first = unloaded ?? ladderModes(L, sc.matrix, N);
  if (!unloaded) modes.set(0, first);
  const unloadedFrequency = Math.sqrt(first.omega2[0]) / (2 * Math.PI);
  return { L, C: sc.matrix, unloadedFrequency, sections: N, nodeHeights: sc.nodeZ, fieldCapacitance, former, modes };
}

/** The design's structure in the field model's frame: heights above the ground plane. */
export function fieldGeometry(d: DesignSI): StructureGeometry {
  const s = d.secondary;
  const ground = d.groundClearance;
  const D = windingDiameter(s);
  const len = windingLength(s);
  let topload: AxisymmetricShape | null = null;
  if (d.topload) {
    const h = toploadCentreHeight(d, d.topload);
    topload =
      d.topload.shape === 'toroid'
        ? { kind: 'torus', R: 0.5 * (d.topload.majorDiameter - d.topload.minorDiameter), r: 0.5 * d.topload.minorDiameter, centreZ: h }
        : { kind: 'sphere', radius: 0.5 * d.topload.diameter, centreZ: h };
  }
  const rings: Array<{ r: number; z: number; wireRadius: number }> = [];
  if (d.primary) {
    for (const ring of primaryRings(primaryParams(d.primary))) {
      rings.push({ r: ring.r, z: ring.z + ground, wireRadius: 0.5 * d.primary.conductorDiameter });
    }
  }
  if (d.strikeRail) rings.push({ r: 0.5 * d.strikeRail.diameter, z: d.strikeRail.height + ground, wireRadius: 0.5 * d.strikeRail.conductorDiameter });
  return { winding: { radius: D / 2, zBottom: ground + s.elevation, length: len }, topload, rings, ground: true };
}
