import { z } from 'zod';
import { MEASUREMENT_KINDS, MEASUREMENT_KIND_IDS, type MeasurementKind } from '../../troubleshoot/bench';
import { timestampSchema } from './common';

/** Plausible ranges per kind, so a slip of the unit prefix is caught with a message naming `value`. */
export const MEASUREMENT_RANGES: Record<MeasurementKind, { max: number; hint: string }> = {
  'secondary-inductance': { max: 10, hint: 'in henries, e.g. 0.012 for 12 mH' },
  'bare-frequency': { max: 100e6, hint: 'in hertz, e.g. 310000 for 310 kHz' },
  'loaded-frequency': { max: 100e6, hint: 'in hertz, e.g. 190000 for 190 kHz' },
  'primary-inductance': { max: 1, hint: 'in henries, e.g. 0.00005 for 50 µH' },
  coupling: { max: 0.999, hint: 'k as a number between 0 and 1' },
  'spark-length': { max: 100, hint: 'in metres' },
  'tap-position': { max: 1000, hint: 'turns from the inner end' },
  'wound-turns': { max: 100000, hint: 'turns on the secondary' },
  'winding-length': { max: 10, hint: 'in metres, e.g. 0.56 for 560 mm' },
  'primary-ring-frequency': { max: 100e6, hint: 'in hertz, e.g. 95000 for 95 kHz' },
  'peak-primary-current': { max: 1e5, hint: 'in amperes, e.g. 400 for 400 A' },
  'trip-setting': { max: 1e5, hint: 'in amperes, e.g. 450 for 450 A' },
};

export const measurementKindSchema = z.enum(MEASUREMENT_KIND_IDS, {
  error: `kind must be one of: ${MEASUREMENT_KIND_IDS.join(', ')}.`,
});

const measuredAt = z.union([z.iso.date(), z.iso.datetime({ offset: true })], {
  error: 'Give the date of the measurement as an ISO date, e.g. 2026-03-14.',
});

/** POST /api/v1/designs/:id/measurements: the value in SI (H, Hz, m, turns; k as a number). */
export const measurementBodySchema = z
  .object({
    kind: measurementKindSchema,
    value: z.number({ error: 'Give the measured value as a number in SI units.' }).finite('The value must be a finite number.'),
    unit: z.string().optional(),
    measuredAt,
    instrument: z.string().trim().max(120, 'Keep the instrument under 120 characters.').optional(),
    notes: z.string().trim().max(2000, 'Keep the notes under 2000 characters.').optional(),
  })
  .superRefine((b, ctx) => {
    const spec = MEASUREMENT_KINDS[b.kind];
    if (b.unit !== undefined && b.unit !== spec.unit) {
      ctx.addIssue({ code: 'custom', path: ['unit'], message: `A ${spec.label.toLowerCase()} is recorded in ${spec.unit}; convert the value to SI.` });
    }
    const range = MEASUREMENT_RANGES[b.kind];
    if (!(b.value > 0) || b.value > range.max) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `The value must be above 0 and at most ${range.max} (${range.hint}).` });
    }
    if (Date.parse(b.measuredAt) > Date.now() + 36 * 3600e3) {
      ctx.addIssue({ code: 'custom', path: ['measuredAt'], message: 'The measurement date is in the future.' });
    }
  });

/** A measurement as the bench log shows it, beside its prediction. */
export const measurementSchema = z.object({
  id: z.string(),
  kind: measurementKindSchema,
  label: z.string(),
  value: z.number(),
  unit: z.string(),
  measuredAt: timestampSchema,
  instrument: z.string().nullable(),
  notes: z.string().nullable(),
  predicted: z.number().nullable(),
  /** (measured − predicted) / predicted × 100 */
  errorPercent: z.number().nullable(),
  createdAt: timestampSchema,
});

/** GET /api/v1/designs/:id/measurements */
export const measurementListResponseSchema = z.object({ measurements: z.array(measurementSchema) });

/** PUT /api/v1/designs/:id/calibration: measured values adopted in place of predictions. A number sets, null clears, absent keeps. */
export const calibrationBodySchema = z
  .object({
    loadedFrequency: z
      .number({ error: 'Give the measured loaded frequency in Hz, or null to clear it.' })
      .positive('The loaded frequency must be above 0 Hz.')
      .max(100e6, 'A loaded frequency above 100 MHz is not a coil’s.')
      .nullable()
      .optional(),
    tankCapacitance: z
      .number({ error: 'Give the measured tank capacitance in F, or null to clear it.' })
      .positive('The tank capacitance must be above 0 F.')
      .max(1e-3, 'A tank capacitance above 1 mF is not plausible.')
      .nullable()
      .optional(),
    coupling: z
      .number({ error: 'Give the measured coupling coefficient k (0–1), or null to clear it.' })
      .gt(0, 'k must be above 0.')
      .lt(1, 'k must be below 1.')
      .nullable()
      .optional(),
  })
  .strict();

/** The adopted values as stored: each present value is a positive SI number. */
export const calibrationSchema = z.object({
  loadedFrequency: z.number().optional(),
  tankCapacitance: z.number().optional(),
  coupling: z.number().optional(),
});

/** GET and PUT /api/v1/designs/:id/calibration */
export const calibrationResponseSchema = z.object({
  calibration: calibrationSchema,
  predicted: z.object({ loadedFrequency: z.number().nullable(), tapTurns: z.number().nullable() }),
  calibrated: z.object({ targetFrequency: z.number(), tapTurns: z.number().nullable(), inRange: z.boolean() }).nullable(),
});

export type MeasurementBody = z.input<typeof measurementBodySchema>;
export type Measurement = z.infer<typeof measurementSchema>;
export type MeasurementListResponse = z.infer<typeof measurementListResponseSchema>;
export type CalibrationBody = z.input<typeof calibrationBodySchema>;
export type StoredCalibration = z.infer<typeof calibrationSchema>;
export type CalibrationResponse = z.infer<typeof calibrationResponseSchema>;
export type { MeasurementKind };
