import { and, asc, eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { z } from 'zod';
import type { Db } from '../db/client';
import { designs, measurements } from '../db/schema';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize, parseBody } from './designs';
import { solvedRow, solveStored, type SolvedDesign } from './solve';
import { MEASUREMENT_KINDS, MEASUREMENT_KIND_IDS, predictionFor, relativeError, type MeasurementKind } from '../../lib/troubleshoot';
import { calibratedTuning, calibrationSchema, mergeCalibration, readCalibration } from '../../lib/buildsheet';

/** Plausible ranges per kind, so a slip of the unit prefix is caught with a message naming `value`. */
const RANGES: Record<MeasurementKind, { max: number; hint: string }> = {
  'secondary-inductance': { max: 10, hint: 'in henries, e.g. 0.012 for 12 mH' },
  'bare-frequency': { max: 100e6, hint: 'in hertz, e.g. 310000 for 310 kHz' },
  'loaded-frequency': { max: 100e6, hint: 'in hertz, e.g. 190000 for 190 kHz' },
  'primary-inductance': { max: 1, hint: 'in henries, e.g. 0.00005 for 50 µH' },
  coupling: { max: 0.999, hint: 'k as a number between 0 and 1' },
  'spark-length': { max: 100, hint: 'in metres' },
  'tap-position': { max: 1000, hint: 'turns from the inner end' },
};

const measuredAt = z.union([z.iso.date(), z.iso.datetime({ offset: true })], {
  error: 'Give the date of the measurement as an ISO date, e.g. 2026-03-14.',
});

export const measurementKindSchema = z.enum(MEASUREMENT_KIND_IDS, {
  error: `kind must be one of: ${MEASUREMENT_KIND_IDS.join(', ')}.`,
});

export const measurementBody = z
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
    const range = RANGES[b.kind];
    if (!(b.value > 0) || b.value > range.max) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `The value must be above 0 and at most ${range.max} (${range.hint}).` });
    }
    if (Date.parse(b.measuredAt) > Date.now() + 36 * 3600e3) {
      ctx.addIssue({ code: 'custom', path: ['measuredAt'], message: 'The measurement date is in the future.' });
    }
  });

export const measurementSchema = z.object({
  id: z.string(),
  kind: measurementKindSchema,
  label: z.string(),
  value: z.number(),
  unit: z.string(),
  measuredAt: z.string(),
  instrument: z.string().nullable(),
  notes: z.string().nullable(),
  predicted: z.number().nullable(),
  /** (measured − predicted) / predicted × 100 */
  errorPercent: z.number().nullable(),
  createdAt: z.string(),
});
export type MeasurementView = z.infer<typeof measurementSchema>;

type Row = typeof measurements.$inferSelect;

function view(r: Row, result: ReturnType<typeof solveStored>): MeasurementView {
  const kind = r.kind as MeasurementKind;
  const spec = MEASUREMENT_KINDS[kind];
  const predicted = spec ? predictionFor(kind, result) : null;
  const err = relativeError(r.value, predicted);
  return {
    id: r.id,
    kind,
    label: spec?.label ?? r.kind,
    value: r.value,
    unit: r.unit,
    measuredAt: r.measuredAt.toISOString(),
    instrument: r.instrument,
    notes: r.notes,
    predicted,
    errorPercent: err === null ? null : err * 100,
    createdAt: r.createdAt.toISOString(),
  };
}

export async function measurementRows(db: Db, designId: string): Promise<Row[]> {
  return db.select().from(measurements).where(eq(measurements.designId, designId)).orderBy(asc(measurements.measuredAt), asc(measurements.createdAt));
}

export async function listMeasurements(db: Db, u: SessionUser | null, designId: string) {
  const { row } = await authorize(db, designId, u, 'read');
  return measurementsOf(db, solvedRow(row));
}

/** The bench log of a design already authorized, with each reading beside the prediction of its solved result. */
export async function measurementsOf(db: Db, d: SolvedDesign) {
  const rows = await measurementRows(db, d.id);
  return { measurements: rows.map((r) => view(r, d.result)) };
}

export async function createMeasurement(db: Db, u: SessionUser, designId: string, body: unknown) {
  const { row } = await authorize(db, designId, u, 'write');
  const b = parseBody(measurementBody, body);
  const id = randomUUID();
  await db.insert(measurements).values({
    id,
    designId,
    kind: b.kind,
    value: b.value,
    unit: MEASUREMENT_KINDS[b.kind].unit,
    measuredAt: new Date(b.measuredAt),
    instrument: b.instrument || null,
    notes: b.notes || null,
    authorId: u.id,
  });
  const inserted = await db.query.measurements.findFirst({ where: eq(measurements.id, id) });
  return view(inserted!, solveStored(row.design));
}

export async function deleteMeasurement(db: Db, u: SessionUser, designId: string, measurementId: string) {
  await authorize(db, designId, u, 'write');
  const res = await db
    .delete(measurements)
    .where(and(eq(measurements.id, measurementId), eq(measurements.designId, designId)))
    .returning({ id: measurements.id });
  if (res.length === 0) throw new ApiError('not_found', 'No such measurement.');
}

export const calibrationResponseSchema = z.object({
  calibration: z.object({ loadedFrequency: z.number().optional(), tankCapacitance: z.number().optional(), coupling: z.number().optional() }),
  predicted: z.object({ loadedFrequency: z.number().nullable(), tapTurns: z.number().nullable() }),
  calibrated: z.object({ targetFrequency: z.number(), tapTurns: z.number().nullable(), inRange: z.boolean() }).nullable(),
});

/** The stored calibration of a design already authorized, with the predicted and the calibrated tuning. */
export function calibrationOf(d: Pick<SolvedDesign, 'parsed' | 'result' | 'calibration'>) {
  const calibration = readCalibration(d.calibration);
  const { parsed, result } = d;
  const cal = parsed.ok && result ? calibratedTuning(parsed.design, result, calibration) : null;
  return {
    calibration,
    predicted: { loadedFrequency: result?.system?.resonantFrequency ?? null, tapTurns: result?.tuning?.tapTurns ?? null },
    calibrated: cal ? { targetFrequency: cal.targetFrequency, tapTurns: cal.tapTurns, inRange: cal.inRange } : null,
  };
}

export async function getCalibration(db: Db, u: SessionUser | null, designId: string) {
  const { row } = await authorize(db, designId, u, 'read');
  return calibrationOf(solvedRow(row));
}

export async function putCalibration(db: Db, u: SessionUser, designId: string, body: unknown) {
  const { row } = await authorize(db, designId, u, 'write');
  const update = parseBody(calibrationSchema, body);
  const next = mergeCalibration(readCalibration(row.calibration), update);
  await db.update(designs).set({ calibration: next }).where(eq(designs.id, designId));
  return calibrationOf(solvedRow({ ...row, calibration: next }));
}
