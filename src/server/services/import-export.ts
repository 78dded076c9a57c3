import { DESIGN_FILE_FORMAT, DESIGN_FILE_VERSION, designFileBodySchema, type DesignFile, type DesignRecord } from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError, issuesOf } from '../http';
import { authorize } from './access';
import { createDesign } from './designs';
import { prefixIssues, validateDesign } from './solve';

export async function exportDesign(u: SessionUser, designId: string): Promise<{ file: DesignFile; fileName: string }> {
  const { row } = await authorize(designId, u, 'read');
  const file: DesignFile = { format: DESIGN_FILE_FORMAT, version: DESIGN_FILE_VERSION, name: row.name, design: row.design, exportedAt: new Date().toISOString() };
  return { file, fileName: fileNameFor(row.name) };
}

export function fileNameFor(name: string): string {
  const base = name.normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'design';
  return `${base}.coilwright.json`;
}

/** Checks the whole file first (envelope and design, every issue at once), so a refused import creates nothing. */
export async function importDesign(u: SessionUser, body: unknown): Promise<DesignRecord> {
  if (body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw new ApiError('validation_failed', 'The file must be a JSON object in the Coilwright design format.', [{ path: '', message: 'Expected a JSON object.' }]);
  }
  const issues: Array<{ path: string; message: string }> = [];
  const env = designFileBodySchema.safeParse(body);
  if (!env.success) issues.push(...issuesOf(env.error));
  const design = (body as Record<string, unknown>).design;
  if (design === undefined) {
    if (!issues.some((i) => i.path === 'design')) issues.push({ path: 'design', message: 'The design is missing.' });
  } else {
    try {
      validateDesign(design);
    } catch (e) {
      if (e instanceof ApiError && e.issues) issues.push(...prefixIssues(e.issues, 'design'));
      else throw e;
    }
  }
  if (issues.length || !env.success) throw new ApiError('validation_failed', 'The file cannot be imported; nothing was created.', issues);
  return createDesign(u, { name: env.data.name, design, message: 'Imported from a design file' });
}
