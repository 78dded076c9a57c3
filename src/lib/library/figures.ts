/**
 * The key results a builder compares and posts for review, with their SI units. Paths point into the solver's
 * result of the public API; the labels are ours.
 */
export type Figure = { key: string; label: string; path: string; unit: string };

export const keyFigures: Figure[] = [
  { key: 'loadedFrequency', label: 'Loaded resonant frequency (with topload)', path: 'system.resonantFrequency', unit: 'Hz' },
  { key: 'secondaryFrequency', label: 'Secondary alone (no topload)', path: 'secondary.resonantFrequency', unit: 'Hz' },
  { key: 'targetFrequency', label: 'Tuning target (with streamer allowance)', path: 'tuning.targetFrequency', unit: 'Hz' },
  { key: 'tapTurns', label: 'Primary tap (turns from the inner end)', path: 'tuning.tapTurns', unit: 'turns' },
  { key: 'k', label: 'Coupling coefficient k (all primary turns)', path: 'coupling.k', unit: '' },
  { key: 'secondaryInductance', label: 'Secondary inductance', path: 'secondary.inductance', unit: 'H' },
  { key: 'selfCapacitance', label: 'Secondary self-capacitance', path: 'secondary.selfCapacitance', unit: 'F' },
  { key: 'toploadCapacitance', label: 'Topload capacitance', path: 'topload.capacitance', unit: 'F' },
  { key: 'wireLength', label: 'Secondary wire length', path: 'secondary.wireLength', unit: 'm' },
  { key: 'windingLength', label: 'Secondary winding length', path: 'secondary.windingLength', unit: 'm' },
  { key: 'aspectRatio', label: 'Secondary aspect ratio (length / diameter)', path: 'secondary.aspectRatio', unit: '' },
  { key: 'primaryInductance', label: 'Primary inductance (all turns)', path: 'primary.inductance', unit: 'H' },
  { key: 'mutualInductance', label: 'Mutual inductance', path: 'coupling.mutualInductance', unit: 'H' },
  { key: 'tankCapacitance', label: 'Tank capacitance', path: 'tank.capacitance', unit: 'F' },
  { key: 'tankVoltageRating', label: 'Tank voltage rating', path: 'tank.voltageRating', unit: 'V' },
  { key: 'tankEnergy', label: 'Tank energy at the supply peak', path: 'tank.energyAtSupplyPeak', unit: 'J' },
  { key: 'resonantCapacitance', label: 'Supply-resonant capacitance', path: 'supply.resonantCapacitance', unit: 'F' },
];

export function pick(obj: unknown, path: string): unknown {
  let cur: unknown = obj;
  for (const part of path.split('.')) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string, unknown>)[part];
  }
  return cur;
}

export function figureValue(result: unknown, f: Figure): number | null {
  const v = pick(result, f.path);
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}
