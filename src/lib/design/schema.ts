import { z } from 'zod';
import { numberField, quantityField } from './fields';
import { designField, KNOWN_FIELD_NAMES } from './registry';
import { checkDesignName, DESIGN_NAME_REQUIRED } from './name';

/** A design's name as the API takes it: trimmed, with the one name rule. */
export const designNameSchema = z
  .string({ error: DESIGN_NAME_REQUIRED })
  .trim()
  .superRefine((name, ctx) => {
    const message = checkDesignName(name);
    if (message) ctx.addIssue({ code: 'custom', message });
  });

export const FORMER_MATERIALS = ['air', 'pvc', 'acrylic', 'polyethylene', 'polystyrene', 'cardboard'] as const;

export const formerSchema = z
  .strictObject({
    material: z
      .enum(FORMER_MATERIALS, { error: () => `expected one of ${FORMER_MATERIALS.map((m) => `"${m}"`).join(', ')}` })
      .describe(designField('secondary.former.material').help)
      .optional(),
    permittivity: numberField('secondary.former.permittivity').optional(),
    wallThickness: quantityField('secondary.former.wallThickness').optional(),
  })
  .superRefine((f, ctx) => {
    if (f.material !== undefined && f.permittivity !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['permittivity'], message: 'give either a material or a permittivity, not both' });
    }
  })
  .describe("the coil form's dielectric; default a thin PVC pipe (εr 3.0, 3 mm wall)");

export const wireAwgSchema = z
  .strictObject({
    awg: numberField('secondary.wire.awg'),
    insulation: z
      .enum(['bare', 'single', 'heavy'], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected "bare", "single" or "heavy"') })
      .describe(designField('secondary.wire.insulation').help),
  })
  .describe('magnet wire by gauge');

export const wireDiameterSchema = z
  .strictObject({
    diameter: quantityField('secondary.wire.diameter'),
    insulatedDiameter: quantityField('secondary.wire.insulatedDiameter'),
  })
  .describe('wire by measured diameters');

export const secondarySchema = z.strictObject({
  formDiameter: quantityField('secondary.formDiameter'),
  turns: numberField('secondary.turns'),
  wire: z.union([wireAwgSchema, wireDiameterSchema], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected { awg, insulation } or { diameter, insulatedDiameter }') }),
  windingLength: quantityField('secondary.windingLength').optional(),
  elevation: quantityField('secondary.elevation').optional(),
  former: formerSchema.nullable().optional(),
});

export const strikeRailSchema = z
  .strictObject({
    diameter: quantityField('strikeRail.diameter'),
    height: quantityField('strikeRail.height').optional(),
    conductorDiameter: quantityField('strikeRail.conductorDiameter').optional(),
  })
  .describe('a grounded ring around the primary');

export const toroidSchema = z.strictObject({
  shape: z.literal('toroid'),
  majorDiameter: quantityField('topload.majorDiameter'),
  minorDiameter: quantityField('topload.minorDiameter'),
  elevation: quantityField('topload.elevation').optional(),
});

export const sphereSchema = z.strictObject({
  shape: z.literal('sphere'),
  diameter: quantityField('topload.diameter'),
  elevation: quantityField('topload.elevation').optional(),
});

export const toploadSchema = z.discriminatedUnion('shape', [toroidSchema, sphereSchema], {
  error: (iss) => (iss.input === undefined ? 'is required' : 'expected shape "toroid" or "sphere"'),
});

export const primarySchema = z
  .strictObject({
    shape: z
      .enum(['flat', 'helical', 'conical'], { error: (iss) => (iss.input === undefined ? 'is required' : 'expected "flat", "helical" or "conical"') }),
    innerDiameter: quantityField('primary.innerDiameter'),
    turns: numberField('primary.turns'),
    conductorDiameter: quantityField('primary.conductorDiameter'),
    spacing: quantityField('primary.spacing'),
    angle: quantityField('primary.angle').optional(),
    elevation: quantityField('primary.elevation').optional(),
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
  capacitance: quantityField('tank.capacitance'),
});

export const tankBankSchema = z.strictObject({
  unitCapacitance: quantityField('tank.unitCapacitance'),
  unitVoltage: quantityField('tank.unitVoltage'),
  series: numberField('tank.series'),
  parallel: numberField('tank.parallel'),
  unitRmsCurrent: quantityField('tank.unitRmsCurrent').optional(),
});

export const tankSchema = z.union([tankSingleSchema, tankBankSchema], {
  error: (iss) =>
    iss.input === undefined ? 'is required' : 'expected { capacitance } or { unitCapacitance, unitVoltage, series, parallel }',
});

export const transformerSupplySchema = z.strictObject({
  kind: z.literal('transformer'),
  voltage: quantityField('supply.voltage'),
  current: quantityField('supply.current'),
  lineFrequency: quantityField('supply.lineFrequency'),
  breakRate: quantityField('supply.breakRate').optional(),
});

export const solidStateSupplySchema = z.strictObject({
  kind: z.literal('solid-state'),
  busVoltage: quantityField('supply.busVoltage'),
  topology: z
    .enum(['dual-resonant', 'single-resonant'], { error: () => 'expected "dual-resonant" or "single-resonant"' })
    .describe(designField('supply.topology').help)
    .optional(),
  bridge: z
    .enum(['full', 'half'], { error: () => 'expected "full" or "half"' })
    .describe(designField('supply.bridge').help)
    .optional(),
  onTime: quantityField('supply.onTime').optional(),
  repetitionRate: quantityField('supply.repetitionRate').optional(),
  switchPeakCurrent: quantityField('supply.switchPeakCurrent').optional(),
  currentLimit: quantityField('supply.currentLimit').optional(),
  busCapacitance: quantityField('supply.busCapacitance').optional(),
  tuningRatio: numberField('supply.tuningRatio').optional(),
});

export const supplySchema = z.discriminatedUnion('kind', [transformerSupplySchema, solidStateSupplySchema], {
  error: (iss) => (iss.input === undefined ? 'is required' : 'expected kind "transformer" or "solid-state"'),
});

export const tuningSchema = z
  .strictObject({
    streamerCapacitance: quantityField('tuning.streamerCapacitance').optional(),
    streamerLength: quantityField('tuning.streamerLength').optional(),
    targetCoupling: numberField('tuning.targetCoupling').optional(),
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
  groundClearance: quantityField('groundClearance').optional(),
  topload: toploadSchema.nullable().optional(),
  strikeRail: strikeRailSchema.nullable().optional(),
  primary: primarySchema.nullable().optional(),
  tank: tankSchema.nullable().optional(),
  supply: supplySchema.nullable().optional(),
  tuning: tuningSchema.nullable().optional(),
});

export type DesignInput = z.input<typeof designInputSchema>;

/** Every field name the schema knows, for "did you mean" hints on unknown keys. */
export const KNOWN_FIELDS: readonly string[] = KNOWN_FIELD_NAMES;
