import type { Db } from '../db/client';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize } from './designs';
import { prefixIssues } from './solve';
import { parseDesign } from '../../lib/design';
import { solve } from '../../solver';
import { buildSheet, buildSheetQuerySchema, MAX_CHECKPOINTS, readCalibration, sheetSections, type BuildSheetQuery } from '../../lib/buildsheet';

/** Reads rpm, margin and every from a URL's query; a bad one is a 400 naming it. */
export function parseBuildSheetQuery(url: URL): BuildSheetQuery {
  const raw: Record<string, string> = {};
  for (const key of ['rpm', 'margin', 'every'] as const) {
    const v = url.searchParams.get(key);
    if (v !== null && v !== '') raw[key] = v;
  }
  const r = buildSheetQuerySchema.safeParse(raw);
  if (!r.success) {
    throw new ApiError(
      'validation_failed',
      'Some parameters need attention.',
      r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
    );
  }
  return r.data;
}

/** The build sheet of a design the user may read: numbers, display sections and the design's name. */
export async function getBuildSheet(db: Db, u: SessionUser | null, designId: string, query: BuildSheetQuery) {
  const { row, role } = await authorize(db, designId, u, 'read');
  const parsed = parseDesign(row.design);
  if (!parsed.ok) throw new ApiError('validation_failed', 'The saved design has invalid fields; fix it in the designer first.', prefixIssues(parsed.issues, 'design'));
  if (parsed.design.secondary.turns / query.every > MAX_CHECKPOINTS) {
    const least = Math.ceil(parsed.design.secondary.turns / MAX_CHECKPOINTS);
    throw new ApiError('validation_failed', 'Some parameters need attention.', [
      { path: 'every', message: `every must be at least ${least} turns for this coil (at most ${MAX_CHECKPOINTS} checkpoints).` },
    ]);
  }
  const result = solve(parsed.design);
  const calibration = readCalibration(row.calibration);
  const sheet = buildSheet(parsed.design, result, query, calibration);
  return {
    id: row.id,
    name: row.name,
    revision: row.revision,
    role,
    sheet,
    sections: sheetSections(sheet),
    warnings: result.warnings,
  };
}
