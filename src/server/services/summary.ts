import { desc, eq } from 'drizzle-orm';
import { database } from './database';
import { measurements } from '../db/schema';
import { summaryQuerySchema, type StoredCalibration } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { parseQuery } from '../http';
import { designSummary, type Measured, type SummaryFormat } from '../../lib/library/summary';
import { authorize } from './access';
import { sharedRow } from './shares';
import { solvedRow } from './solve';
import { calibrationOf } from './measurements';

/** The summary's format from a URL's query (text unless markdown is asked for); anything else is a 400 naming `format`. */
export function parseSummaryFormat(url: URL): SummaryFormat {
  return parseQuery(url, summaryQuerySchema, 'Choose format=text or format=markdown.').format;
}

function calibrationRows(calibration: StoredCalibration | null): Measured[] {
  if (!calibration) return [];
  const units: Record<keyof StoredCalibration, string> = { loadedFrequency: 'Hz', tankCapacitance: 'F', coupling: '' };
  return (Object.keys(units) as Array<keyof StoredCalibration>)
    .flatMap((kind) => {
      const value = calibration[kind];
      return typeof value === 'number' && Number.isFinite(value) ? [{ kind, value }] : [];
    })
    .map(({ kind, value }) => ({ kind: `${kind} (adopted)`, value, unit: units[kind], measuredAt: '', instrument: null, notes: null }));
}

async function measuredOf(designId: string, calibration: StoredCalibration | null): Promise<Measured[]> {
  const rows = await database().select().from(measurements).where(eq(measurements.designId, designId)).orderBy(desc(measurements.measuredAt));
  return [
    ...rows.map((m) => ({ kind: m.kind, value: m.value, unit: m.unit, measuredAt: m.measuredAt.toISOString(), instrument: m.instrument, notes: m.notes })),
    ...calibrationRows(calibration),
  ];
}

export async function summaryForDesign(u: SessionUser, designId: string, format: SummaryFormat): Promise<string> {
  const { row } = await authorize(designId, u, 'read');
  const solved = solvedRow(row);
  return designSummary(
    {
      name: row.name,
      revision: row.revision,
      updatedAt: row.updatedAt.toISOString(),
      design: row.design,
      result: solved.result,
      calibrated: calibrationOf(solved).calibrated,
      measured: await measuredOf(row.id, row.calibration),
    },
    format,
  );
}

export async function summaryForShared(token: string, format: SummaryFormat, origin: string): Promise<string> {
  const row = await sharedRow(token);
  const solved = solvedRow(row);
  return designSummary(
    {
      name: row.name,
      revision: row.revision,
      updatedAt: row.updatedAt.toISOString(),
      design: row.design,
      result: solved.result,
      calibrated: calibrationOf(solved).calibrated,
      measured: await measuredOf(row.id, row.calibration),
      url: `${origin}/s/${token}`,
    },
    format,
  );
}
