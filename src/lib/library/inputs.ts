import { formatSI } from './format';

/** Labels and SI units of the design's input fields (the public design format), for summaries and comparisons. */
export const inputFields: Record<string, { label: string; unit: string }> = {
  'secondary.formDiameter': { label: 'Secondary form diameter', unit: 'm' },
  'secondary.turns': { label: 'Secondary turns', unit: 'turns' },
  'secondary.wire.awg': { label: 'Secondary wire gauge (AWG)', unit: '' },
  'secondary.wire.insulation': { label: 'Secondary wire enamel', unit: '' },
  'secondary.wire.diameter': { label: 'Secondary wire diameter (bare)', unit: 'm' },
  'secondary.wire.insulatedDiameter': { label: 'Secondary wire diameter (insulated)', unit: 'm' },
  'secondary.windingLength': { label: 'Secondary winding length', unit: 'm' },
  'secondary.elevation': { label: 'Secondary elevation', unit: 'm' },
  groundClearance: { label: 'Primary plane above ground', unit: 'm' },
  'topload.shape': { label: 'Topload shape', unit: '' },
  'topload.majorDiameter': { label: 'Topload overall diameter', unit: 'm' },
  'topload.minorDiameter': { label: 'Topload tube diameter', unit: 'm' },
  'topload.diameter': { label: 'Topload diameter', unit: 'm' },
  'topload.elevation': { label: 'Topload centre above winding top', unit: 'm' },
  'primary.shape': { label: 'Primary shape', unit: '' },
  'primary.innerDiameter': { label: 'Primary inner diameter', unit: 'm' },
  'primary.turns': { label: 'Primary turns', unit: 'turns' },
  'primary.conductorDiameter': { label: 'Primary conductor diameter', unit: 'm' },
  'primary.spacing': { label: 'Primary spacing (gap)', unit: 'm' },
  'primary.angle': { label: 'Primary cone angle', unit: 'rad' },
  'primary.elevation': { label: 'Primary elevation', unit: 'm' },
  'tank.capacitance': { label: 'Tank capacitance', unit: 'F' },
  'tank.unitCapacitance': { label: 'Tank capacitor, each unit', unit: 'F' },
  'tank.unitVoltage': { label: 'Tank capacitor voltage, each unit', unit: 'V' },
  'tank.series': { label: 'Tank units in series', unit: '' },
  'tank.parallel': { label: 'Tank strings in parallel', unit: '' },
  'supply.kind': { label: 'Supply', unit: '' },
  'supply.voltage': { label: 'Supply voltage (RMS)', unit: 'V' },
  'supply.current': { label: 'Supply current (RMS)', unit: 'A' },
  'supply.lineFrequency': { label: 'Line frequency', unit: 'Hz' },
  'supply.breakRate': { label: 'Break rate', unit: 'Hz' },
  'supply.busVoltage': { label: 'Bus voltage', unit: 'V' },
  'tuning.streamerCapacitance': { label: 'Streamer allowance', unit: 'F' },
  'tuning.streamerLength': { label: 'Expected streamer length', unit: 'm' },
  'tuning.targetCoupling': { label: 'Target coupling k', unit: '' },
};

/** Every leaf of a JSON value as `path → value`; `null` sections are leaves so that removing one shows. */
export function flatten(value: unknown, prefix = '', out: Map<string, unknown> = new Map()): Map<string, unknown> {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.length === 0 && prefix) out.set(prefix, value);
    for (const [k, v] of entries) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (prefix) out.set(prefix, value);
  return out;
}

export function inputLabel(path: string): string {
  return inputFields[path]?.label ?? path;
}

/** Strings with units stay as the builder wrote them; bare numbers are SI and get a prefix. */
export function formatInput(path: string, value: unknown): string {
  if (value === undefined) return '—';
  if (value === null) return 'none';
  if (typeof value === 'string') return value;
  if (typeof value === 'number') {
    const unit = inputFields[path]?.unit ?? '';
    if (unit === 'rad') return `${Number(((value * 180) / Math.PI).toPrecision(4))} deg`;
    if (unit === 'turns' || unit === '') return String(value);
    return formatSI(value, unit, 4);
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return JSON.stringify(value);
}
