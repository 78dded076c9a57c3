import { and, asc, eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { database } from './database';
import { designs, measurements } from '../db/schema';
import type { CalibrationResponse, calibrationBodySchema, Measurement, MeasurementListResponse, measurementBodySchema } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize } from './access';
import { solvedRow, solveStored, type SolvedDesign } from './solve';
import { MEASUREMENT_KINDS, predictionFor, relativeError, type MeasurementKind } from '../../lib/troubleshoot';
import { calibratedTuning, mergeCalibration, readCalibration } from '../../lib/buildsheet';

type Row = typeof measurements.$inferSelect;

function view(r: Row, result: ReturnType<typeof solveStored>): Measurement {
  const kind = r.kind;
  const spec = MEASUREMENT_KINDS[kind] as (typeof MEASUREMENT_KINDS)[MeasurementKind] | undefined;
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

export async function measurementRows(designId: string): Promise<Row[]> {
  return database().select().from(measurements).where(eq(measurements.designId, designId)).orderBy(asc(measurements.measuredAt), asc(measurements.createdAt));
}

export async function listMeasurements(u: SessionUser | null, designId: string): Promise<MeasurementListResponse> {
  const { row } = await authorize(designId, u, 'read');
  return measurementsOf(solvedRow(row));
}

/** The bench log of a design already authorized, with each reading beside the prediction of its solved result. */
export async function measurementsOf(d: SolvedDesign): Promise<MeasurementListResponse> {
  const rows = await measurementRows(d.id);
  return { measurements: rows.map((r) => view(r, d.result)) };
}

export async function createMeasurement(u: SessionUser, designId: string, b: z.output<typeof measurementBodySchema>): Promise<Measurement> {
  const { row } = await authorize(designId, u, 'write');
  const id = randomUUID();
  const db = database();
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

export async function deleteMeasurement(u: SessionUser, designId: string, measurementId: string): Promise<void> {
  await authorize(designId, u, 'write');
  const res = await database()
    .delete(measurements)
    .where(and(eq(measurements.id, measurementId), eq(measurements.designId, designId)))
    .returning({ id: measurements.id });
  if (res.length === 0) throw new ApiError('not_found', 'No such measurement.');
}

/** The stored calibration of a design already authorized, with the predicted and the calibrated tuning. */
export function calibrationOf(d: Pick<SolvedDesign, 'parsed' | 'result' | 'calibration'>): CalibrationResponse {
  const calibration = readCalibration(d.calibration);
  const { parsed, result } = d;
  const cal = parsed.ok && result ? calibratedTuning(parsed.design, result, calibration) : null;
  return {
    calibration,
    predicted: { loadedFrequency: result?.system?.resonantFrequency ?? null, tapTurns: result?.tuning?.tapTurns ?? null },
    calibrated: cal ? { targetFrequency: cal.targetFrequency, tapTurns: cal.tapTurns, inRange: cal.inRange } : null,
  };
}

export async function getCalibration(u: SessionUser | null, designId: string): Promise<CalibrationResponse> {
  const { row } = await authorize(designId, u, 'read');
  return calibrationOf(solvedRow(row));
}

export async function putCalibration(u: SessionUser, designId: string, update: z.output<typeof calibrationBodySchema>): Promise<CalibrationResponse> {
  const { row } = await authorize(designId, u, 'write');
  const next = mergeCalibration(readCalibration(row.calibration), update);
  await database().update(designs).set({ calibration: next }).where(eq(designs.id, designId));
  return calibrationOf(solvedRow({ ...row, calibration: next }));
}
