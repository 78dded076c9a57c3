import { MEASUREMENT_KINDS, type MeasurementKind } from '../../lib/troubleshoot/bench';
import { siFactor } from '../../lib/format/units';

const units = (...labels: string[]) => labels.map((label) => ({ label, factor: siFactor(label)! }));

/** Units offered for typing a value of each SI unit, with the factor to SI. First is the default. */
export const INPUT_UNITS: Record<string, Array<{ label: string; factor: number }>> = {
  H: units('mH', 'µH', 'H'),
  Hz: units('kHz', 'MHz', 'Hz'),
  m: units('in', 'cm', 'm'),
  '1': [{ label: 'k', factor: 1 }],
  turns: [{ label: 'turns', factor: 1 }],
  A: units('A', 'kA', 'mA'),
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
