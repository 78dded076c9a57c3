import { z } from 'zod';
import { designNameSchema, designRoleSchema, resultSchema, revisionMessageSchema, storedDesignSchema, timestampSchema } from './common';

/** POST /api/v1/designs. `design` is checked by the design schema separately, so every issue names its field under "design.". */
export const createDesignBodySchema = z.object({ name: designNameSchema, design: z.unknown(), message: revisionMessageSchema.optional() });

/** PUT /api/v1/designs/:id: `revision` is the one the edit started from; a newer one on the server is a 409. */
export const updateDesignBodySchema = z.object({
  name: designNameSchema.optional(),
  design: z.unknown(),
  revision: z.number({ error: 'Give the revision you edited (a whole number).' }).int().min(1),
  message: revisionMessageSchema.optional(),
});

/** GET/PUT /api/v1/designs/:id and every call that creates a design (POST, duplicate, import, copy, restore). */
export const designRecordSchema = z.object({
  id: z.string(),
  name: z.string(),
  design: storedDesignSchema,
  revision: z.number().int().min(1),
  role: designRoleSchema,
  /** present on GET */
  updatedAt: timestampSchema.optional(),
  /** present on GET: the group whose members reach the design, or null */
  groupId: z.string().nullable().optional(),
  /** null when the stored design no longer validates */
  result: resultSchema.nullable(),
});

/** One row of GET /api/v1/designs. */
export const designListItemSchema = z.object({
  id: z.string(),
  name: z.string(),
  role: designRoleSchema,
  revision: z.number().int().min(1),
  updatedAt: timestampSchema,
  loadedFrequency: z.number().nullable(),
  tapTurns: z.number().nullable(),
  /** the design's group and its name, or null */
  groupId: z.string().nullable(),
  groupName: z.string().nullable(),
  /** the tap for the values adopted on the bench; null when none were adopted */
  calibratedTapTurns: z.number().nullable().optional(),
});

export const designListResponseSchema = z.object({ designs: z.array(designListItemSchema) });

export type CreateDesignBody = z.input<typeof createDesignBodySchema>;
export type UpdateDesignBody = z.input<typeof updateDesignBodySchema>;
export type DesignRecord = z.infer<typeof designRecordSchema>;
export type DesignListItem = z.infer<typeof designListItemSchema>;
export type DesignListResponse = z.infer<typeof designListResponseSchema>;
