import type { SessionUser } from '../session';
import { ApiError, parseQuery } from '../http';
import { authorize } from './access';
import { prefixIssues } from './solve';
import { parseDesign } from '../../lib/design';
import { solve } from '../../solver';
import { buildSheet, buildSheetQuerySchema, MAX_CHECKPOINTS, readCalibration, sheetSections, type BuildSheetQuery } from '../../lib/buildsheet';

/** Reads rpm, margin and every from a URL's query; a bad one is a 400 naming it. */
export function parseBuildSheetQuery(url: URL): BuildSheetQuery {
  return parseQuery(url, buildSheetQuerySchema);
}

/** The build sheet of a design the user may read: numbers, display sections and the design's name. */
export async function getBuildSheet(u: SessionUser | null, designId: string, query: BuildSheetQuery) {
  const { row, role } = await authorize(designId, u, 'read');
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
