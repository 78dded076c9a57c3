import { z } from 'zod';
import type { Db } from '../db/client';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize, createDesign, designNameSchema } from './designs';
import { prefixIssues, validateDesign } from './solve';

export const DESIGN_FILE_FORMAT = 'coilwright-design';
export const DESIGN_FILE_VERSION = 1;
/** Far above any real design (a few kB); keeps a stray upload from tying up the server. */
export const IMPORT_LIMIT_BYTES = 256 * 1024;

export const designFileSchema = z.object({
  format: z.literal(DESIGN_FILE_FORMAT, { error: `This is not a Coilwright design file (format must be "${DESIGN_FILE_FORMAT}").` }),
  version: z.literal(DESIGN_FILE_VERSION, { error: `Only version ${DESIGN_FILE_VERSION} design files can be read.` }),
  name: designNameSchema,
  design: z.unknown(),
  exportedAt: z.string().optional(),
});

export type DesignFile = { format: typeof DESIGN_FILE_FORMAT; version: typeof DESIGN_FILE_VERSION; name: string; design: unknown; exportedAt: string };

export async function exportDesign(db: Db, u: SessionUser, designId: string) {
  const { row } = await authorize(db, designId, u, 'read');
  const file: DesignFile = { format: DESIGN_FILE_FORMAT, version: DESIGN_FILE_VERSION, name: row.name, design: row.design, exportedAt: new Date().toISOString() };
  return { file, fileName: fileNameFor(row.name) };
}

export function fileNameFor(name: string): string {
  const base = name.normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'design';
  return `${base}.coilwright.json`;
}

/** Checks the whole file first (envelope and design, every issue at once), so a refused import creates nothing. */
export async function importDesign(db: Db, u: SessionUser, body: unknown) {
  if (body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw new ApiError('validation_failed', 'The file must be a JSON object in the Coilwright design format.', [{ path: '', message: 'Expected a JSON object.' }]);
  }
  const issues: Array<{ path: string; message: string }> = [];
  const env = designFileSchema.safeParse(body);
  if (!env.success) issues.push(...env.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })));
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
  return createDesign(db, u, { name: env.data.name, design, message: 'Imported from a design file' });
}
