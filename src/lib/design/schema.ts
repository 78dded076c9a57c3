import { z } from 'zod';
import { AWG_MAX, AWG_MIN } from '../../solver/wire/awg';
import { count, quantity } from './fields';

const DEG = Math.PI / 180;

// Physical bounds: wide enough for any coil a person builds, narrow enough to catch unit slips.
const b = {
  formDiameter: { min: 5e-3, max: 3, minInclusive: true, label: 'between 5 mm and 3 m' },
  wireDiameter: { min: 10e-6, max: 12e-3, minInclusive: true, label: 'between 0.01 mm and 12 mm' },
  windingLength: { min: 1e-3, max: 10, minInclusive: true, label: 'between 1 mm and 10 m' },
  elevation: { min: -5, max: 5, minInclusive: true, label: 'between −5 m and 5 m' },
  groundClearance: { min: 0, max: 20, minInclusive: true, label: 'between 0 and 20 m' },
  toploadDiameter: { min: 1e-2, max: 10, minInclusive: true, label: 'between 1 cm and 10 m' },
  primaryInnerDiameter: { min: 5e-3, max: 10, minInclusive: true, label: 'between 5 mm and 10 m' },
  conductorDiameter: { min: 0.1e-3, max: 0.1, minInclusive: true, label: 'between 0.1 mm and 10 cm' },
  spacing: { min: 0, max: 0.5, minInclusive: true, label: 'between 0 and 50 cm' },
  angle: { min: 0, max: 90 * DEG, minInclusive: false, label: 'greater than 0 and less than 90 deg (a plain number is read in radians)' },
  capacitance: { min: 1e-12, max: 1e-3, minInclusive: true, label: 'between 1 pF and 1 mF' },
  tankVoltage: { min: 1, max: 2e6, minInclusive: true, label: 'between 1 V and 2 MV' },
  supplyVoltage: { min: 1, max: 1e6, minInclusive: true, label: 'between 1 V and 1 MV' },
  supplyCurrent: { min: 1e-6, max: 1e4, minInclusive: true, label: 'between 1 µA and 10 kA' },
  lineFrequency: { min: 1, max: 2000, minInclusive: true, label: 'between 1 Hz and 2 kHz' },
  breakRate: { min: 1, max: 1e5, minInclusive: true, label: 'between 1 and 100 000 per second' },
  streamerCapacitance: { min: 0, max: 1e-9, minInclusive: true, label: 'between 0 and 1 nF' },
  streamerLength: { min: 0, max: 50, minInclusive: true, label: 'between 0 and 50 m' },
  secondaryTurns: { min: 1, max: 20000, minInclusive: true, label: 'a whole number from 1 to 20000' },
  primaryTurns: { min: 0.25, max: 200, minInclusive: true, label: 'between 0.25 and 200 (fractions allowed)' },
  awg: { min: AWG_MIN, max: AWG_MAX, minInclusive: true, label: `a whole gauge from ${AWG_MIN} (0000) to ${AWG_MAX}` },
  series: { min: 1, max: 10000, minInclusive: true, label: 'a whole number from 1 to 10000' },
  coupling: { min: 0, max: 0.9, minInclusive: false, label: 'greater than 0 and at most 0.9' },
  permittivity: { min: 1, max: 20, minInclusive: true, label: 'between 1 (air) and 20' },
  wallThickness: { min: 0, max: 1.5, minInclusive: true, label: 'between 0 and 1.5 m (a wall as thick as the radius is a solid rod)' },
  railDiameter: { min: 1e-2, max: 20, minInclusive: true, label: 'between 1 cm and 20 m' },
} as const;

export const FORMER_MATERIALS = ['air', 'pvc', 'acrylic', 'polyethylene', 'polystyrene', 'cardboard'] as const;

export const formerSchema = z
  .strictObject({
    material: z
      .enum(FORMER_MATERIALS, { error: () => `expected one of ${FORMER_MATERIALS.map((m) => `"${m}"`).join(', ')}` })
      .describe('material of the coil form; sets the permittivity')
      .optional(),
    permittivity: count(b.permittivity, 'relative permittivity of the form wall (instead of a material)', false).optional(),
    wallThickness: quantity('length', b.wallThickness, 'wall thickness of the form; default 3 mm').optional(),
  })
  .superRefine((f, ctx) => {
    if (f.material !== undefined && f.permittivity !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['permittivity'], message: 'give either a material or a permittivity, not both' });
    }
  })
  .describe('the coil form\'s dielectric; default a thin PVC pipe (εr 3.0, 3 mm wall)');

export const wireAwgSchema = z
  .strictObject({
    awg: count(b.awg, 'American Wire Gauge per ASTM B258 (0 = AWG 0, −3 = AWG 0000)', true),
    insulation: z
      .enum(['bare', 'single', 'heavy'], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected "bare", "single" or "heavy"') })
      .describe('enamel build; the insulated diameter comes from a typical film-build table (from memory)'),
  })
  .describe('magnet wire by gauge');

export const wireDiameterSchema = z
  .strictObject({
    diameter: quantity('length', b.wireDiameter, 'bare copper diameter'),
    insulatedDiameter: quantity('length', b.wireDiameter, 'outside diameter over the insulation'),
  })
  .describe('wire by measured diameters');

export const secondarySchema = z.strictObject({
  formDiameter: quantity('length', b.formDiameter, 'outer diameter of the coil form'),
  turns: count(b.secondaryTurns, 'turns of the secondary winding', true),
  wire: z.union([wireAwgSchema, wireDiameterSchema], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected { awg, insulation } or { diameter, insulatedDiameter }') }),
  windingLength: quantity('length', b.windingLength, 'length of the winding; default close-wound, turns × insulated diameter').optional(),
  elevation: quantity('length', b.elevation, 'bottom of the winding above the primary reference plane; default 0').optional(),
  former: formerSchema.nullable().optional(),
});

export const strikeRailSchema = z
  .strictObject({
    diameter: quantity('length', b.railDiameter, 'centre-line diameter of the grounded strike rail'),
    height: quantity('length', b.elevation, 'height of the rail above the primary reference plane; default 0').optional(),
    conductorDiameter: quantity('length', b.conductorDiameter, 'diameter of the rail\'s conductor; default 6 mm').optional(),
  })
  .describe('a grounded ring around the primary');

export const toroidSchema = z.strictObject({
  shape: z.literal('toroid'),
  majorDiameter: quantity('length', b.toploadDiameter, 'overall outside diameter'),
  minorDiameter: quantity('length', b.toploadDiameter, 'tube (cross-section) diameter'),
  elevation: quantity('length', b.elevation, 'centre of the topload above the top of the winding; default 0').optional(),
});

export const sphereSchema = z.strictObject({
  shape: z.literal('sphere'),
  diameter: quantity('length', b.toploadDiameter, 'sphere diameter'),
  elevation: quantity('length', b.elevation, 'centre of the topload above the top of the winding; default 0').optional(),
});

export const toploadSchema = z.discriminatedUnion('shape', [toroidSchema, sphereSchema], {
  error: (iss) => (iss.input === undefined ? 'is required' : 'expected shape "toroid" or "sphere"'),
});

export const primarySchema = z
  .strictObject({
    shape: z
      .enum(['flat', 'helical', 'conical'], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected "flat", "helical" or "conical"') }),
    innerDiameter: quantity('length', b.primaryInnerDiameter, 'centre-line diameter of the innermost turn'),
    turns: count(b.primaryTurns, 'turns of the primary', false),
    conductorDiameter: quantity('length', b.conductorDiameter, 'diameter of the primary conductor (tube or wire)'),
    spacing: quantity('length', b.spacing, 'gap between neighbouring conductor surfaces'),
    angle: quantity('angle', b.angle, 'conical only: rise of the cone above horizontal').optional(),
    elevation: quantity('length', b.elevation, 'height of the innermost turn above the primary reference plane; default 0').optional(),
  })
  .superRefine((p, ctx) => {
    if (p.shape === 'conical' && p.angle === undefined) {
      ctx.addIssue({ code: 'custom', path: ['angle'], message: 'is required for a conical primary, such as "30 deg"' });
    }
    if (p.shape !== 'conical' && p.angle !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['angle'], message: `applies to conical primaries only; remove it or set shape to "conical"` });
    }
  });

export const tankSingleSchema = z.strictObject({
  capacitance: quantity('capacitance', b.capacitance, 'tank capacitance'),
});

export const tankBankSchema = z.strictObject({
  unitCapacitance: quantity('capacitance', b.capacitance, 'capacitance of each capacitor'),
  unitVoltage: quantity('voltage', b.tankVoltage, 'DC voltage rating of each capacitor'),
  series: count(b.series, 'capacitors in each string', true),
  parallel: count(b.series, 'strings in parallel', true),
});

export const tankSchema = z.union([tankSingleSchema, tankBankSchema], {
  error: (iss) =>
    iss.input === undefined ? 'is required' : 'expected { capacitance } or { unitCapacitance, unitVoltage, series, parallel }',
});

export const transformerSupplySchema = z.strictObject({
  kind: z.literal('transformer'),
  voltage: quantity('voltage', b.supplyVoltage, 'RMS output voltage'),
  current: quantity('current', b.supplyCurrent, 'RMS rated (short-circuit) output current'),
  lineFrequency: quantity('frequency', b.lineFrequency, 'mains frequency'),
  breakRate: quantity('frequency', b.breakRate, 'spark-gap firings per second; default twice the line frequency').optional(),
});

export const solidStateSupplySchema = z.strictObject({
  kind: z.literal('solid-state'),
  busVoltage: quantity('voltage', b.supplyVoltage, 'DC bus voltage'),
});

export const supplySchema = z.discriminatedUnion('kind', [transformerSupplySchema, solidStateSupplySchema], {
  error: (iss) => (iss.input === undefined ? 'is required' : 'expected kind "transformer" or "solid-state"'),
});

export const tuningSchema = z
  .strictObject({
    streamerCapacitance: quantity('capacitance', b.streamerCapacitance, 'allowance for streamer loading; default 0').optional(),
    streamerLength: quantity('length', b.streamerLength, 'expected streamer length; gives 1 pF per foot when no capacitance is given').optional(),
    targetCoupling: count(b.coupling, 'coupling coefficient to find a secondary elevation for', false).optional(),
  })
  .superRefine((t, ctx) => {
    if (t.streamerCapacitance !== undefined && t.streamerLength !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['streamerLength'], message: 'give either streamerCapacitance or streamerLength, not both' });
    }
  });

/**
 * The design as a user gives it (and as a saved design stores it): quantities stay as given, numbers
 * in SI or strings with units. Unknown fields are rejected so that typos are caught.
 */
export const designInputSchema = z.strictObject({
  secondary: secondarySchema,
  groundClearance: quantity('length', b.groundClearance, 'height of the primary reference plane above the ground; default 0.5 m').optional(),
  topload: toploadSchema.nullable().optional(),
  strikeRail: strikeRailSchema.nullable().optional(),
  primary: primarySchema.nullable().optional(),
  tank: tankSchema.nullable().optional(),
  supply: supplySchema.nullable().optional(),
  tuning: tuningSchema.nullable().optional(),
});

export type DesignInput = z.input<typeof designInputSchema>;

/** Every field name the schema knows, for "did you mean" hints on unknown keys. */
export const KNOWN_FIELDS: readonly string[] = [
  'secondary', 'formDiameter', 'turns', 'wire', 'awg', 'insulation', 'diameter', 'insulatedDiameter', 'windingLength',
  'elevation', 'groundClearance', 'topload', 'shape', 'majorDiameter', 'minorDiameter', 'primary', 'innerDiameter',
  'conductorDiameter', 'spacing', 'angle', 'tank', 'capacitance', 'unitCapacitance', 'unitVoltage', 'series', 'parallel',
  'supply', 'kind', 'voltage', 'current', 'lineFrequency', 'breakRate', 'busVoltage', 'tuning', 'streamerCapacitance',
  'streamerLength', 'targetCoupling', 'former', 'material', 'permittivity', 'wallThickness', 'strikeRail', 'height',
];
