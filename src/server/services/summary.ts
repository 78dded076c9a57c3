import { desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import type { Db } from '../db/client';
import { measurements } from '../db/schema';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { designSummary, type Measured, type SummaryFormat } from '../../lib/library/summary';
import { authorize, getShared } from './designs';
import { solveStored } from './solve';

export const summaryQuery = z.object({ format: z.enum(['text', 'markdown'], { error: 'Choose text or markdown.' }).default('text') });

export function parseSummaryFormat(url: URL): SummaryFormat {
  const r = summaryQuery.safeParse({ format: url.searchParams.get('format') ?? undefined });
  if (!r.success) throw new ApiError('validation_failed', 'Choose format=text or format=markdown.', [{ path: 'format', message: 'Choose text or markdown.' }]);
  return r.data.format;
}

function calibrationRows(calibration: unknown): Measured[] {
  if (!calibration || typeof calibration !== 'object') return [];
  const units: Record<string, string> = { loadedFrequency: 'Hz', k: '', tapTurns: 'turns' };
  return Object.entries(calibration as Record<string, unknown>)
    .filter((e): e is [string, number] => typeof e[1] === 'number' && Number.isFinite(e[1]))
    .map(([kind, value]) => ({ kind: `${kind} (adopted)`, value, unit: units[kind] ?? '', measuredAt: '', instrument: null, notes: null }));
}

async function measuredOf(db: Db, designId: string, calibration: unknown): Promise<Measured[]> {
  const rows = await db.select().from(measurements).where(eq(measurements.designId, designId)).orderBy(desc(measurements.measuredAt));
  return [
    ...rows.map((m) => ({ kind: m.kind, value: m.value, unit: m.unit, measuredAt: m.measuredAt.toISOString(), instrument: m.instrument, notes: m.notes })),
    ...calibrationRows(calibration),
  ];
}

export async function summaryForDesign(db: Db, u: SessionUser, designId: string, format: SummaryFormat) {
  const { row } = await authorize(db, designId, u, 'read');
  return designSummary(
    {
      name: row.name,
      revision: row.revision,
      updatedAt: row.updatedAt.toISOString(),
      design: row.design,
      result: solveStored(row.design),
      measured: await measuredOf(db, row.id, row.calibration),
    },
    format,
  );
}

export async function summaryForShared(db: Db, token: string, format: SummaryFormat, origin: string) {
  const shared = await getShared(db, token);
  const share = await db.query.designShares.findFirst({ where: (t, { eq: e }) => e(t.token, token) });
  const row = share ? await db.query.designs.findFirst({ where: (t, { eq: e }) => e(t.id, share.designId) }) : undefined;
  if (!row) throw new ApiError('not_found', 'This link does not exist or was revoked.');
  return designSummary(
    {
      name: shared.name,
      revision: shared.revision,
      updatedAt: shared.updatedAt,
      design: shared.design,
      result: shared.result,
      measured: await measuredOf(db, row.id, row.calibration),
      url: `${origin}/s/${token}`,
    },
    format,
  );
}
