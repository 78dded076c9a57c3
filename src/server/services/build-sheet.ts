import type { SessionUser } from '../session';
import { ApiError, parseQuery } from '../http';
import { authorize } from './access';
import { requireSolved, solvedRow, type SolvedDesign } from './solve';
import type { DesignRole } from '../../lib/permissions';
import { buildSheet, buildSheetQuerySchema, MAX_CHECKPOINTS, readCalibration, sheetSections, type BuildSheetQuery } from '../../lib/buildsheet';

/** Reads rpm, margin and every from a URL's query; a bad one is a 400 naming it. */
export function parseBuildSheetQuery(url: URL): BuildSheetQuery {
  return parseQuery(url, buildSheetQuerySchema);
}

/** The build sheet of a design the user may read: numbers, display sections and the design's name. */
export async function getBuildSheet(u: SessionUser | null, designId: string, query: BuildSheetQuery) {
  const { row, role } = await authorize(designId, u, 'read');
  return buildSheetOf({ ...row, role, solved: solvedRow(row) }, query);
}

/** The build sheet of a design already authorized, from its solved result. */
export function buildSheetOf(d: { name: string; revision: number; role: DesignRole; solved: SolvedDesign }, query: BuildSheetQuery) {
  const { design, result } = requireSolved(d.solved);
  if (design.secondary.turns / query.every > MAX_CHECKPOINTS) {
    const least = Math.ceil(design.secondary.turns / MAX_CHECKPOINTS);
    throw new ApiError('validation_failed', 'Some parameters need attention.', [
      { path: 'every', message: `every must be at least ${least} turns for this coil (at most ${MAX_CHECKPOINTS} checkpoints).` },
    ]);
  }
  const calibration = readCalibration(d.solved.calibration);
  const sheet = buildSheet(design, result, query, calibration);
  return {
    id: d.solved.id,
    name: d.name,
    revision: d.revision,
    role: d.role,
    sheet,
    sections: sheetSections(sheet),
    warnings: result.warnings,
  };
}
