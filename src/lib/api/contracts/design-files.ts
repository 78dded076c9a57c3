import { z } from 'zod';
import { designNameSchema, storedDesignSchema, timestampSchema } from './common';

export const DESIGN_FILE_FORMAT = 'coilwright-design';
export const DESIGN_FILE_VERSION = 1;
/** Far above any real design (a few kB); keeps a stray upload from tying up the server. */
export const IMPORT_LIMIT_BYTES = 256 * 1024;

/** POST /api/v1/designs/import: a coilwright-design file (docs/design-format.md). `design` is checked by the design schema. */
export const designFileBodySchema = z.object({
  format: z.literal(DESIGN_FILE_FORMAT, { error: `This is not a Coilwright design file (format must be "${DESIGN_FILE_FORMAT}").` }),
  version: z.literal(DESIGN_FILE_VERSION, { error: `Only version ${DESIGN_FILE_VERSION} design files can be read.` }),
  name: designNameSchema,
  design: z.unknown(),
  exportedAt: z.string().optional(),
});

/** GET /api/v1/designs/:id/export: the file as downloaded. */
export const designFileSchema = z.object({
  format: z.literal(DESIGN_FILE_FORMAT),
  version: z.literal(DESIGN_FILE_VERSION),
  name: z.string(),
  design: storedDesignSchema,
  exportedAt: timestampSchema,
});

export type DesignFileBody = z.input<typeof designFileBodySchema>;
export type DesignFile = z.infer<typeof designFileSchema>;
