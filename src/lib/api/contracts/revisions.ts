import { z } from 'zod';
import { designNameSchema, resultSchema, resultSummarySchema, revisionMessageSchema, storedDesignSchema, timestampSchema } from './common';

/** One row of GET /api/v1/designs/:id/revisions, newest first. */
export const revisionListItemSchema = z.object({
  revision: z.number().int().min(1),
  createdAt: timestampSchema,
  /** the author's name, or "former member" once their account is gone */
  author: z.string(),
  name: z.string(),
  message: z.string().nullable(),
  summary: resultSummarySchema.nullable(),
});

export const revisionListResponseSchema = z.object({ revisions: z.array(revisionListItemSchema) });

/** GET /api/v1/designs/:id/revisions/:revision */
export const revisionRecordSchema = z.object({
  revision: z.number().int().min(1),
  name: z.string(),
  design: storedDesignSchema,
  createdAt: timestampSchema,
  message: z.string().nullable(),
  result: resultSchema.nullable(),
});

/** POST /api/v1/designs/:id/revisions/:revision/restore; the body may be left out. */
export const restoreRevisionBodySchema = z
  .object({
    revision: z.number({ error: 'Give the latest revision you saw (a whole number).' }).int().min(1).optional(),
    message: revisionMessageSchema.optional(),
  })
  .optional();

/** POST /api/v1/designs/:id/duplicate and /api/v1/shared/:token/copy; the body may be left out. */
export const copyDesignBodySchema = z.object({ name: designNameSchema.optional() }).optional();

const revisionNumber = (path: 'from' | 'to') =>
  z.coerce
    .number({ error: 'A whole revision number is needed.' })
    .int('A whole revision number is needed.')
    .min(1, 'A whole revision number is needed.')
    .meta({ description: `revision number (${path})` });

/** GET /api/v1/designs/:id/compare?from=&to= */
export const compareQuerySchema = z.object({ from: revisionNumber('from'), to: revisionNumber('to') });

const compareSideSchema = z.object({ revision: z.number().int(), name: z.string(), createdAt: timestampSchema, message: z.string().nullable() });

export const inputChangeSchema = z.object({ path: z.string(), label: z.string(), from: z.string(), to: z.string() });

export const figureChangeSchema = z.object({
  key: z.string(),
  label: z.string(),
  unit: z.string(),
  from: z.number().nullable(),
  to: z.number().nullable(),
  fromText: z.string(),
  toText: z.string(),
  /** (to − from) / |from|; null when either side is missing or from is 0 */
  relative: z.number().nullable(),
  changed: z.boolean(),
});

export const compareResponseSchema = z.object({
  from: compareSideSchema,
  to: compareSideSchema,
  nameChanged: z.boolean(),
  inputs: z.array(inputChangeSchema),
  figures: z.array(figureChangeSchema),
});

export type RevisionListItem = z.infer<typeof revisionListItemSchema>;
export type RevisionListResponse = z.infer<typeof revisionListResponseSchema>;
export type RevisionRecord = z.infer<typeof revisionRecordSchema>;
export type RestoreRevisionBody = z.input<typeof restoreRevisionBodySchema>;
export type CopyDesignBody = z.input<typeof copyDesignBodySchema>;
export type CompareQuery = z.output<typeof compareQuerySchema>;
export type InputChange = z.infer<typeof inputChangeSchema>;
export type FigureChange = z.infer<typeof figureChangeSchema>;
export type CompareResponse = z.infer<typeof compareResponseSchema>;

/** The `:revision` of a path: a whole number from 1; anything else names no revision (404). */
export const revisionNumberParamSchema = z.coerce.number().int().min(1);
