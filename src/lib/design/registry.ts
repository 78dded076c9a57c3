/**
 * Every input field of a design, said once: its path in the design format, what kind of value it takes,
 * its label (the trade's terms, in our words), what it means, its bounds and the form's starting value.
 * The design schema, the designer's form, the library's summaries and comparisons all read this list.
 *
 * A new field is one entry here plus its place in the schema's object (schema.ts); the registry test fails
 * until both agree.
 */
import { AWG_MAX, AWG_MIN } from '../../solver/wire/awg';
import type { UnitSystem } from '../format/length';
import type { QuantityKind } from '../format/units';

const DEG = Math.PI / 180;

/** Primary frequency over the secondary's when a solid-state design gives none (common practice for dual-resonant coils). */
export const DEFAULT_TUNING_RATIO = 0.9;
/** What a solid-state supply saved with fewer fields takes for the rest (common practice), in SI. */
export const SOLID_STATE_DEFAULTS = {
  topology: 'dual-resonant',
  bridge: 'full',
  onTime: 100e-6,
  repetitionRate: 200,
  tuningRatio: DEFAULT_TUNING_RATIO,
} as const;

/** A quantity kind (a value with a unit), or a plain number, or one of a few words. */
export type FieldKind = QuantityKind | 'count' | 'ratio' | 'gauge' | 'choice';

export interface Bounds {
  /** smallest accepted value in SI; `minInclusive` decides whether it is itself allowed */
  min: number;
  max: number;
  minInclusive?: boolean;
  /** the bounds as people say them, for the message */
  label: string;
}

export interface ChoiceOption {
  value: string;
  label: string;
}

/** The form's text for a field when nothing is given yet: the same in both systems, or one per system. */
export type FieldDefault = string | { metric: string; imperial: string } | { metres: number };

export interface FieldSpec {
  path: string;
  kind: FieldKind;
  /** the field's name wherever a person reads it: form, summaries, comparisons */
  label: string;
  /** what the value means, for the schema's description and the API document */
  help: string;
  /** a short typing hint under the form's input; lengths without one get "A length with its unit, e.g. …" */
  hint?: string;
  /** for lengths: an example in each system, for the hint */
  example?: { metric: string; imperial: string };
  bounds?: Bounds;
  /** counts and gauges: whole numbers only */
  integer?: boolean;
  /** may be left out of a design (a schema default applies) */
  optional?: boolean;
  options?: readonly ChoiceOption[];
  default: FieldDefault;
}

const elevationBounds: Bounds = { min: -5, max: 5, minInclusive: true, label: 'between −5 m and 5 m' };
const toploadBounds: Bounds = { min: 1e-2, max: 10, minInclusive: true, label: 'between 1 cm and 10 m' };
const wireBounds: Bounds = { min: 10e-6, max: 12e-3, minInclusive: true, label: 'between 0.01 mm and 12 mm' };
const capacitanceBounds: Bounds = { min: 1e-12, max: 1e-3, minInclusive: true, label: 'between 1 pF and 1 mF' };
const supplyVoltageBounds: Bounds = { min: 1, max: 1e6, minInclusive: true, label: 'between 1 V and 1 MV' };
const bankCountBounds: Bounds = { min: 1, max: 10000, minInclusive: true, label: 'a whole number from 1 to 10000' };
const toploadElevationHelp = 'centre of the topload above the top of the winding; default 0';

// Physical bounds: wide enough for any coil a person builds, narrow enough to catch unit slips.
export const DESIGN_FIELDS = [
  {
    path: 'secondary.formDiameter',
    kind: 'length',
    label: 'Form outer diameter',
    help: 'outer diameter of the coil form',
    example: { metric: '114 mm', imperial: '4.5 in' },
    bounds: { min: 5e-3, max: 3, minInclusive: true, label: 'between 5 mm and 3 m' },
    default: { metric: '100 mm', imperial: '4 in' },
  },
  {
    path: 'secondary.turns',
    kind: 'count',
    label: 'Secondary turns',
    help: 'turns of the secondary winding',
    hint: 'Whole turns of the winding',
    integer: true,
    bounds: { min: 1, max: 20000, minInclusive: true, label: 'a whole number from 1 to 20000' },
    default: '900',
  },
  {
    path: 'secondary.wire.awg',
    kind: 'gauge',
    label: 'Wire gauge (AWG)',
    help: 'American Wire Gauge per ASTM B258 (0 = AWG 0, −3 = AWG 0000)',
    integer: true,
    bounds: { min: AWG_MIN, max: AWG_MAX, minInclusive: true, label: `a whole gauge from ${AWG_MIN} (0000) to ${AWG_MAX}` },
    default: '24',
  },
  {
    path: 'secondary.wire.insulation',
    kind: 'choice',
    label: 'Enamel',
    help: 'enamel build; the insulated diameter comes from a typical film-build table (from memory)',
    options: [
      { value: 'heavy', label: 'Heavy build (double enamel)' },
      { value: 'single', label: 'Single build' },
      { value: 'bare', label: 'Bare copper' },
    ],
    default: 'heavy',
  },
  {
    path: 'secondary.wire.diameter',
    kind: 'length',
    label: 'Bare wire diameter',
    help: 'bare copper diameter',
    example: { metric: '0.51 mm', imperial: '0.0201 in' },
    bounds: wireBounds,
    default: '',
  },
  {
    path: 'secondary.wire.insulatedDiameter',
    kind: 'length',
    label: 'Insulated wire diameter',
    help: 'outside diameter over the insulation',
    hint: 'Over the enamel: the pitch when close-wound',
    bounds: wireBounds,
    default: '',
  },
  {
    path: 'secondary.windingLength',
    kind: 'length',
    label: 'Winding length',
    help: 'length of the winding; default close-wound, turns × insulated diameter',
    hint: 'Leave empty for close-wound (turns × insulated diameter)',
    bounds: { min: 1e-3, max: 10, minInclusive: true, label: 'between 1 mm and 10 m' },
    optional: true,
    default: '',
  },
  {
    path: 'secondary.elevation',
    kind: 'length',
    label: 'Winding bottom above primary plane',
    help: 'bottom of the winding above the primary reference plane; default 0',
    hint: 'Height of the first turn above z = 0',
    bounds: elevationBounds,
    optional: true,
    default: { metres: 0 },
  },
  {
    path: 'secondary.former.material',
    kind: 'choice',
    label: 'Form material',
    help: 'material of the coil form; sets its permittivity (typical values, from memory)',
    options: [
      { value: 'pvc', label: 'PVC pipe' },
      { value: 'acrylic', label: 'Acrylic tube' },
      { value: 'polyethylene', label: 'Polyethylene' },
      { value: 'polystyrene', label: 'Polystyrene' },
      { value: 'cardboard', label: 'Cardboard tube' },
      { value: 'air', label: 'Air (self-supporting winding)' },
    ],
    optional: true,
    default: '',
  },
  {
    path: 'secondary.former.permittivity',
    kind: 'ratio',
    label: 'Form relative permittivity',
    help: 'relative permittivity of the form wall, instead of a material',
    hint: 'e.g. 3.0 for PVC; leave empty to use the material',
    bounds: { min: 1, max: 20, minInclusive: true, label: 'between 1 (air) and 20' },
    optional: true,
    default: '',
  },
  {
    path: 'secondary.former.wallThickness',
    kind: 'length',
    label: 'Form wall thickness',
    help: 'wall thickness of the coil form; default 3 mm; as thick as the radius for a solid rod',
    bounds: { min: 0, max: 1.5, minInclusive: true, label: 'between 0 and 1.5 m' },
    optional: true,
    default: '',
  },
  {
    path: 'strikeRail.diameter',
    kind: 'length',
    label: 'Strike rail diameter',
    help: 'centre-line diameter of a grounded ring around the primary',
    bounds: { min: 1e-2, max: 20, minInclusive: true, label: 'between 1 cm and 20 m' },
    default: '',
  },
  {
    path: 'strikeRail.height',
    kind: 'length',
    label: 'Strike rail height',
    help: 'height of the strike rail above the primary reference plane; default 0',
    bounds: elevationBounds,
    optional: true,
    default: '',
  },
  {
    path: 'strikeRail.conductorDiameter',
    kind: 'length',
    label: 'Strike rail conductor',
    help: "diameter of the strike rail's conductor; default 6 mm (assumed)",
    bounds: { min: 0.1e-3, max: 0.1, minInclusive: true, label: 'between 0.1 mm and 10 cm' },
    optional: true,
    default: '',
  },
  {
    path: 'groundClearance',
    kind: 'length',
    label: 'Primary plane above the floor',
    help: 'height of the primary reference plane above the ground; default 0.5 m',
    hint: 'Height of z = 0 over the ground plane; empty for 0.5 m',
    bounds: { min: 0, max: 20, minInclusive: true, label: 'between 0 and 20 m' },
    optional: true,
    default: { metric: '500 mm', imperial: '20 in' },
  },
  {
    path: 'topload.shape',
    kind: 'choice',
    label: 'Topload shape',
    help: 'toroid or sphere',
    options: [
      { value: 'toroid', label: 'Toroid' },
      { value: 'sphere', label: 'Sphere' },
    ],
    default: 'toroid',
  },
  {
    path: 'topload.majorDiameter',
    kind: 'length',
    label: 'Toroid overall diameter',
    help: 'overall outside diameter',
    example: { metric: '500 mm', imperial: '20 in' },
    bounds: toploadBounds,
    default: { metres: 0.45 },
  },
  {
    path: 'topload.minorDiameter',
    kind: 'length',
    label: 'Toroid tube diameter',
    help: 'tube (cross-section) diameter',
    hint: "Diameter of the tube's cross-section",
    bounds: toploadBounds,
    default: { metres: 0.11 },
  },
  {
    path: 'topload.diameter',
    kind: 'length',
    label: 'Sphere diameter',
    help: 'sphere diameter',
    example: { metric: '300 mm', imperial: '12 in' },
    bounds: toploadBounds,
    // small enough that the topload's default elevation clears the winding
    default: { metres: 0.15 },
  },
  {
    path: 'topload.elevation',
    kind: 'length',
    label: 'Topload centre above winding top',
    help: toploadElevationHelp,
    hint: "From the top turn to the topload's centre",
    bounds: elevationBounds,
    optional: true,
    default: { metres: 0.08 },
  },
  {
    path: 'primary.shape',
    kind: 'choice',
    label: 'Primary shape',
    help: 'flat spiral, helix or cone',
    options: [
      { value: 'flat', label: 'Flat spiral' },
      { value: 'helical', label: 'Helical' },
      { value: 'conical', label: 'Conical' },
    ],
    default: 'flat',
  },
  {
    path: 'primary.innerDiameter',
    kind: 'length',
    label: 'Innermost turn diameter',
    help: 'centre-line diameter of the innermost turn',
    hint: 'Centre-line diameter of the first turn',
    bounds: { min: 5e-3, max: 10, minInclusive: true, label: 'between 5 mm and 10 m' },
    default: { metres: 0.16 },
  },
  {
    path: 'primary.turns',
    kind: 'count',
    label: 'Primary turns',
    help: 'turns of the primary',
    hint: 'Fractions allowed, e.g. 11.5',
    bounds: { min: 0.25, max: 200, minInclusive: true, label: 'between 0.25 and 200 (fractions allowed)' },
    default: '10',
  },
  {
    path: 'primary.conductorDiameter',
    kind: 'length',
    label: 'Primary conductor diameter',
    help: 'diameter of the primary conductor (tube or wire)',
    example: { metric: '6 mm', imperial: '0.25 in' },
    bounds: { min: 0.1e-3, max: 0.1, minInclusive: true, label: 'between 0.1 mm and 10 cm' },
    default: { metres: 0.00635 },
  },
  {
    path: 'primary.spacing',
    kind: 'length',
    label: 'Gap between primary turns',
    help: 'gap between neighbouring conductor surfaces',
    hint: 'Between conductor surfaces',
    bounds: { min: 0, max: 0.5, minInclusive: true, label: 'between 0 and 50 cm' },
    default: { metres: 0.00635 },
  },
  {
    path: 'primary.angle',
    kind: 'angle',
    label: 'Cone angle above horizontal',
    help: 'conical only: rise of the cone above horizontal',
    hint: 'An angle, e.g. "30 deg"',
    bounds: { min: 0, max: 90 * DEG, minInclusive: false, label: 'greater than 0 and less than 90 deg (a plain number is read in radians)' },
    optional: true,
    default: '30 deg',
  },
  {
    path: 'primary.elevation',
    kind: 'length',
    label: 'Innermost turn above primary plane',
    help: 'height of the innermost turn above the primary reference plane; default 0',
    hint: 'Usually 0: the primary defines z = 0',
    bounds: elevationBounds,
    optional: true,
    default: { metres: 0 },
  },
  {
    path: 'tank.capacitance',
    kind: 'capacitance',
    label: 'Tank capacitance',
    help: 'tank capacitance',
    hint: 'e.g. "20 nF"',
    bounds: capacitanceBounds,
    default: '10 nF',
  },
  {
    path: 'tank.unitCapacitance',
    kind: 'capacitance',
    label: 'Capacitance of each capacitor',
    help: 'capacitance of each capacitor',
    hint: 'e.g. "150 nF"',
    bounds: capacitanceBounds,
    default: '100 nF',
  },
  {
    path: 'tank.unitVoltage',
    kind: 'voltage',
    label: 'DC rating of each capacitor',
    help: 'DC voltage rating of each capacitor',
    hint: 'e.g. "2 kV"',
    bounds: { min: 1, max: 2e6, minInclusive: true, label: 'between 1 V and 2 MV' },
    default: '2 kV',
  },
  {
    path: 'tank.series',
    kind: 'count',
    label: 'Capacitors in each string',
    help: 'capacitors in each string',
    integer: true,
    bounds: bankCountBounds,
    default: '10',
  },
  {
    path: 'tank.parallel',
    kind: 'count',
    label: 'Strings in parallel',
    help: 'strings in parallel',
    integer: true,
    bounds: bankCountBounds,
    default: '1',
  },
  {
    path: 'tank.unitRmsCurrent',
    kind: 'current',
    label: 'RMS current rating of each capacitor',
    help: "each capacitor's RMS current rating from its data sheet; optional, checked against the bank's RMS current with a solid-state supply",
    hint: 'e.g. "10 A"; empty when unknown',
    bounds: { min: 1e-3, max: 1e4, minInclusive: true, label: 'between 1 mA and 10 kA' },
    optional: true,
    default: '',
  },
  {
    path: 'supply.kind',
    kind: 'choice',
    label: 'Supply',
    help: 'transformer or solid-state bridge',
    options: [
      { value: 'transformer', label: 'Transformer (sign or neon transformer)' },
      { value: 'solid-state', label: 'Solid-state bridge (DC bus)' },
    ],
    default: 'transformer',
  },
  {
    path: 'supply.voltage',
    kind: 'voltage',
    label: 'Transformer output voltage (RMS)',
    help: 'RMS output voltage',
    hint: 'e.g. "12 kV"',
    bounds: supplyVoltageBounds,
    default: '12 kV',
  },
  {
    path: 'supply.current',
    kind: 'current',
    label: 'Transformer rated current (RMS)',
    help: 'RMS rated (short-circuit) output current',
    hint: 'e.g. "30 mA"',
    bounds: { min: 1e-6, max: 1e4, minInclusive: true, label: 'between 1 µA and 10 kA' },
    default: '30 mA',
  },
  {
    path: 'supply.lineFrequency',
    kind: 'frequency',
    label: 'Mains frequency',
    help: 'mains frequency',
    hint: '"50 Hz" or "60 Hz"',
    bounds: { min: 1, max: 2000, minInclusive: true, label: 'between 1 Hz and 2 kHz' },
    default: { metric: '50 Hz', imperial: '60 Hz' },
  },
  {
    path: 'supply.breakRate',
    kind: 'frequency',
    label: 'Gap firings per second',
    help: 'spark-gap firings per second; default twice the line frequency',
    hint: 'e.g. "120 Hz"; empty for twice the mains frequency',
    bounds: { min: 1, max: 1e5, minInclusive: true, label: 'between 1 and 100 000 per second' },
    optional: true,
    default: '',
  },
  {
    path: 'supply.busVoltage',
    kind: 'voltage',
    label: 'DC bus voltage',
    help: 'DC bus voltage',
    hint: 'e.g. "340 V"',
    bounds: supplyVoltageBounds,
    default: '340 V',
  },
  {
    path: 'supply.topology',
    kind: 'choice',
    label: 'Drive topology',
    help: 'dual-resonant: the bridge drives a primary tank tuned below the secondary; single-resonant: the bridge drives a few primary turns with no tank, at the secondary frequency; default dual-resonant',
    options: [
      { value: 'dual-resonant', label: 'Dual-resonant (primary tank)' },
      { value: 'single-resonant', label: 'Single-resonant (no primary tank)' },
    ],
    optional: true,
    default: 'dual-resonant',
  },
  {
    path: 'supply.bridge',
    kind: 'choice',
    label: 'Bridge',
    help: 'full bridge (applies ±bus) or half bridge (applies ±bus/2); default full',
    options: [
      { value: 'full', label: 'Full bridge (±bus)' },
      { value: 'half', label: 'Half bridge (±bus/2)' },
    ],
    optional: true,
    default: 'full',
  },
  {
    path: 'supply.onTime',
    kind: 'time',
    label: 'Interrupter on-time',
    help: 'length of each burst set by the interrupter; default 100 µs (common practice)',
    hint: 'e.g. "150 us"; empty for 100 µs',
    bounds: { min: 1e-6, max: 20e-3, minInclusive: true, label: 'between 1 µs and 20 ms' },
    optional: true,
    default: '100 us',
  },
  {
    path: 'supply.repetitionRate',
    kind: 'frequency',
    label: 'Interrupter repetition rate',
    help: 'bursts per second; default 200 Hz (common practice)',
    hint: 'e.g. "200 Hz"; empty for 200 Hz',
    bounds: { min: 0.1, max: 5e3, minInclusive: true, label: 'between 0.1 Hz and 5 kHz' },
    optional: true,
    default: '200 Hz',
  },
  {
    path: 'supply.switchPeakCurrent',
    kind: 'current',
    label: 'Switch pulsed current rating',
    help: "the switches' pulsed (peak) current rating; optional",
    hint: 'e.g. "600 A"; from the switch data sheet',
    bounds: { min: 0.1, max: 1e5, minInclusive: true, label: 'between 0.1 A and 100 kA' },
    optional: true,
    default: '',
  },
  {
    path: 'supply.currentLimit',
    kind: 'current',
    label: 'Over-current trip setting',
    help: 'the peak primary current at which the controller ends the burst; optional',
    hint: 'e.g. "450 A"; empty for no trip',
    bounds: { min: 0.1, max: 1e5, minInclusive: true, label: 'between 0.1 A and 100 kA' },
    optional: true,
    default: '',
  },
  {
    path: 'supply.busCapacitance',
    kind: 'capacitance',
    label: 'Bus capacitance',
    help: 'capacitance across the DC bus; optional, needed for the bus droop',
    hint: 'e.g. "3300 uF"',
    bounds: { min: 1e-7, max: 10, minInclusive: true, label: 'between 0.1 µF and 10 F' },
    optional: true,
    default: '',
  },
  {
    path: 'supply.tuningRatio',
    kind: 'ratio',
    label: 'Primary to secondary frequency ratio',
    help: `primary (tank) frequency over the secondary's loaded frequency; default ${DEFAULT_TUNING_RATIO} (common practice)`,
    hint: `e.g. 0.9; empty for ${DEFAULT_TUNING_RATIO}`,
    bounds: { min: 0.5, max: 1.5, minInclusive: true, label: 'between 0.5 and 1.5' },
    optional: true,
    default: String(DEFAULT_TUNING_RATIO),
  },
  {
    path: 'tuning.streamerCapacitance',
    kind: 'capacitance',
    label: 'Streamer capacitance allowance',
    help: 'allowance for streamer loading; default 0',
    hint: 'e.g. "3 pF"; empty for none',
    bounds: { min: 0, max: 1e-9, minInclusive: true, label: 'between 0 and 1 nF' },
    optional: true,
    default: '',
  },
  {
    path: 'tuning.streamerLength',
    kind: 'length',
    label: 'Expected streamer length',
    help: 'expected streamer length; gives 1 pF per foot when no capacitance is given',
    example: { metric: '600 mm', imperial: '24 in' },
    bounds: { min: 0, max: 50, minInclusive: true, label: 'between 0 and 50 m' },
    optional: true,
    default: '',
  },
  {
    path: 'tuning.targetCoupling',
    kind: 'ratio',
    label: 'Target coupling k',
    help: 'coupling coefficient to find a secondary elevation for',
    hint: 'e.g. 0.15; the results give the secondary elevation for it',
    bounds: { min: 0, max: 0.9, minInclusive: false, label: 'greater than 0 and at most 0.9' },
    optional: true,
    default: '',
  },
] as const satisfies readonly FieldSpec[];

export type DesignFieldPath = (typeof DESIGN_FIELDS)[number]['path'];
/** Paths of the fields of some kinds, e.g. `PathOfKind<'length'>`. */
export type PathOfKind<K extends FieldKind> = Extract<(typeof DESIGN_FIELDS)[number], { kind: K }>['path'];
type EntryAt<P extends DesignFieldPath> = Extract<(typeof DESIGN_FIELDS)[number], { path: P }>;

const byPath = new Map<string, FieldSpec>(DESIGN_FIELDS.map((f) => [f.path, f]));

/** The registry entry of a field path, as the schema and the form use it. */
export function designField<P extends DesignFieldPath>(path: P): EntryAt<P> & FieldSpec {
  return byPath.get(path) as EntryAt<P> & FieldSpec;
}

/** The entry of any path, e.g. one read from a stored design; undefined when the design has no such field. */
export function findDesignField(path: string): FieldSpec | undefined {
  return byPath.get(path);
}

/** Paths of every field of one kind, e.g. the lengths that follow the unit switch. */
export function pathsOfKind<K extends FieldKind>(kind: K): Array<PathOfKind<K>> {
  return DESIGN_FIELDS.filter((f) => f.kind === kind).map((f) => f.path) as Array<PathOfKind<K>>;
}

/** The one rule for a number typed without its unit, said beside every quantity field and on the event sheet. */
export const BARE_NUMBER_RULE = 'a number alone is refused: give its unit';
/** How counts read grouped digits, said beside every count field. */
export const GROUPING_RULE = '1,000 and 1 000 both read as 1000';

/** The design's parts, in the order a builder works through a coil, with their headings. */
export const DESIGN_PARTS = [
  { key: 'secondary', title: 'Secondary' },
  { key: 'topload', title: 'Topload' },
  { key: 'primary', title: 'Primary' },
  { key: 'tank', title: 'Tank capacitor' },
  { key: 'supply', title: 'Supply' },
  { key: 'tuning', title: 'Tuning' },
  { key: 'groundClearance', title: 'Placement' },
] as const;

/** The SI unit a plain number in a field is read in ('' for counts, ratios and words). */
export function siUnitOf(kind: FieldKind): string {
  switch (kind) {
    case 'length':
      return 'm';
    case 'capacitance':
      return 'F';
    case 'inductance':
      return 'H';
    case 'voltage':
      return 'V';
    case 'current':
      return 'A';
    case 'frequency':
      return 'Hz';
    case 'angle':
      return 'rad';
    case 'time':
      return 's';
    default:
      return '';
  }
}

/** A field's starting text in the form, in the given unit system. */
export function defaultText(f: FieldSpec, system: UnitSystem, lengthText: (metres: number) => string): string {
  const d = f.default;
  if (typeof d === 'string') return d;
  if ('metres' in d) return lengthText(d.metres);
  return d[system];
}

/** Every name the design format knows, for "did you mean" hints on unknown keys. */
export const KNOWN_FIELD_NAMES: readonly string[] = [...new Set(DESIGN_FIELDS.flatMap((f) => f.path.split('.')))];
