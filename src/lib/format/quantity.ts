import { formatFixed, formatSignificant, formatTurns, MISSING } from './number';
import { formatSi } from './si';
import { formatLength, METRES_PER_INCH, type UnitSystem } from './length';

/** The result quantities the designer shows, each with the unit and precision a builder reads it in. */
export type DisplayKind =
  | 'frequency'
  | 'inductance'
  | 'capacitance'
  | 'resistance'
  | 'voltage'
  | 'current'
  | 'energy'
  | 'power'
  | 'time'
  | 'mass'
  | 'length'
  | 'wireLength'
  | 'ratio'
  | 'coupling'
  | 'turns'
  | 'count'
  | 'angle';

export interface FormatOptions {
  system?: UnitSystem;
  digits?: number;
}

/** Exact by definition: the avoirdupois pound (1959), NIST SP 811 (2008) Appendix B.8. */
export const KILOGRAMS_PER_POUND = 0.45359237;

const CAPACITANCE_PREFIXES = ['p', 'n', 'µ', 'm', ''] as const;
const INDUCTANCE_PREFIXES = ['n', 'µ', 'm', ''] as const;

/** Formats an SI value for display. Unit choice: SI prefixes, lengths in the user's system. */
export function formatQuantity(x: number | null | undefined, kind: DisplayKind, options: FormatOptions = {}): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return MISSING;
  const system = options.system ?? 'metric';
  const digits = options.digits ?? 4;
  switch (kind) {
    case 'frequency':
      return formatSi(x, 'Hz', digits);
    case 'inductance':
      return formatSi(x, 'H', digits, INDUCTANCE_PREFIXES);
    case 'capacitance':
      return formatSi(x, 'F', digits, CAPACITANCE_PREFIXES);
    case 'resistance':
      return formatSi(x, 'Ω', digits);
    case 'voltage':
      return formatSi(x, 'V', digits);
    case 'current':
      return formatSi(x, 'A', digits);
    case 'energy':
      return formatSi(x, 'J', digits);
    case 'power':
      return formatSi(x, 'W', digits);
    case 'time':
      return formatSi(x, 's', digits);
    case 'mass':
      return system === 'imperial' ? `${formatSignificant(x / KILOGRAMS_PER_POUND, digits - 1)} lb` : x < 1 ? `${formatSignificant(x * 1000, digits - 1)} g` : `${formatSignificant(x, digits - 1)} kg`;
    case 'length':
      return formatLength(x, system, digits);
    case 'wireLength':
      return formatLength(x, system, digits, 'run');
    case 'ratio':
      return formatFixed(x, 2);
    case 'coupling':
      return formatFixed(x, 3);
    case 'turns':
      return formatTurns(x);
    case 'count':
      return formatFixed(x, 0);
    case 'angle':
      return `${formatSignificant((x * 180) / Math.PI, 3)}°`;
  }
}

/** Unit label for an axis or a CSV header: "kHz", "mm", "in", "pF"… picked once for a whole series. */
export function axisUnit(kind: DisplayKind, system: UnitSystem = 'metric'): { unit: string; factor: number } {
  switch (kind) {
    case 'frequency':
      return { unit: 'kHz', factor: 1e-3 };
    case 'inductance':
      return { unit: 'mH', factor: 1e3 };
    case 'capacitance':
      return { unit: 'pF', factor: 1e12 };
    case 'length':
    case 'wireLength':
      return system === 'imperial' ? { unit: 'in', factor: 1 / METRES_PER_INCH } : { unit: 'mm', factor: 1e3 };
    case 'time':
      return { unit: 'µs', factor: 1e6 };
    case 'energy':
      return { unit: 'J', factor: 1 };
    case 'voltage':
      return { unit: 'kV', factor: 1e-3 };
    case 'current':
      return { unit: 'mA', factor: 1e3 };
    case 'angle':
      return { unit: 'deg', factor: 180 / Math.PI };
    default:
      return { unit: '', factor: 1 };
  }
}

/** The SI unit a value of each display kind is in ('' for plain numbers). */
export function siUnitOfDisplay(kind: DisplayKind): string {
  const units: Record<DisplayKind, string> = {
    frequency: 'Hz',
    inductance: 'H',
    capacitance: 'F',
    resistance: 'Ω',
    voltage: 'V',
    current: 'A',
    energy: 'J',
    power: 'W',
    time: 's',
    mass: 'kg',
    length: 'm',
    wireLength: 'm',
    ratio: '',
    coupling: '',
    turns: 'turns',
    count: '',
    angle: 'rad',
  };
  return units[kind];
}

const ENGINEERING: Partial<Record<DisplayKind, Array<{ unit: string; factor: number }>>> = {
  frequency: [{ unit: 'Hz', factor: 1 }, { unit: 'kHz', factor: 1e-3 }, { unit: 'MHz', factor: 1e-6 }],
  inductance: [{ unit: 'µH', factor: 1e6 }, { unit: 'mH', factor: 1e3 }, { unit: 'H', factor: 1 }],
  capacitance: [{ unit: 'pF', factor: 1e12 }, { unit: 'nF', factor: 1e9 }, { unit: 'µF', factor: 1e6 }],
  time: [{ unit: 'ns', factor: 1e9 }, { unit: 'µs', factor: 1e6 }, { unit: 'ms', factor: 1e3 }, { unit: 's', factor: 1 }],
  voltage: [{ unit: 'V', factor: 1 }, { unit: 'kV', factor: 1e-3 }, { unit: 'MV', factor: 1e-6 }],
  current: [{ unit: 'mA', factor: 1e3 }, { unit: 'A', factor: 1 }],
  energy: [{ unit: 'mJ', factor: 1e3 }, { unit: 'J', factor: 1 }, { unit: 'kJ', factor: 1e-3 }],
};

/**
 * The axis unit for a whole series picked by the size of its values, so ticks read in engineering units
 * (a 240–720 m wire run in metres, not "240000–720000 mm"; a 1.2 MHz series in MHz): the largest unit in
 * which the series' largest value is at least 1. Lengths: mm below a metre, m, km; in below 10 ft, ft.
 */
export function scaledAxisUnit(kind: DisplayKind, system: UnitSystem, values: ReadonlyArray<number | null | undefined>): { unit: string; factor: number } {
  const finite = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
  const size = finite.length ? Math.max(...finite.map(Math.abs)) : 0;
  if (kind === 'length' || kind === 'wireLength') {
    if (system === 'imperial') return size >= 120 * METRES_PER_INCH ? { unit: 'ft', factor: 1 / (12 * METRES_PER_INCH) } : { unit: 'in', factor: 1 / METRES_PER_INCH };
    if (size >= 1000) return { unit: 'km', factor: 1e-3 };
    if (size >= 1) return { unit: 'm', factor: 1 };
    return { unit: 'mm', factor: 1e3 };
  }
  const scale = ENGINEERING[kind];
  if (!scale || size === 0) return axisUnit(kind, system);
  let pick = scale[0];
  for (const s of scale) if (size * s.factor >= 1) pick = s;
  return pick;
}
