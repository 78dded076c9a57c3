import { MEASUREMENT_KINDS, type MeasurementKind } from '../../lib/troubleshoot/bench';

/** Units offered for typing a value of each SI unit, with the factor to SI. First is the default. */
export const INPUT_UNITS: Record<string, Array<{ label: string; factor: number }>> = {
  H: [{ label: 'mH', factor: 1e-3 }, { label: 'µH', factor: 1e-6 }, { label: 'H', factor: 1 }],
  Hz: [{ label: 'kHz', factor: 1e3 }, { label: 'MHz', factor: 1e6 }, { label: 'Hz', factor: 1 }],
  m: [{ label: 'in', factor: 0.0254 }, { label: 'cm', factor: 0.01 }, { label: 'm', factor: 1 }],
  '1': [{ label: 'k', factor: 1 }],
  turns: [{ label: 'turns', factor: 1 }],
};

export function unitsFor(kind: MeasurementKind) {
  return INPUT_UNITS[MEASUREMENT_KINDS[kind].unit];
}

/** Shows an SI value in the first (usual) input unit of its kind, to 4 significant figures. */
export function showValue(value: number, siUnit: string): string {
  const u = INPUT_UNITS[siUnit]?.[0];
  if (!u || !Number.isFinite(value)) return String(value);
  const x = value / u.factor;
  const digits = Math.min(6, Math.max(0, 3 - Math.floor(Math.log10(Math.abs(x) || 1))));
  const suffix = u.label === 'k' ? '' : ` ${u.label}`;
  return `${x.toFixed(digits)}${suffix}`;
}
