import { z } from 'zod';
import { resultSchema, storedDesignSchema, timestampSchema } from './common';
import { calibrationResponseSchema } from './measurements';

/** POST /api/v1/designs/:id/share → 201 */
export const shareLinkSchema = z.object({ token: z.string(), url: z.string() });

export const shareListItemSchema = shareLinkSchema.extend({ createdAt: timestampSchema });

/** GET /api/v1/designs/:id/share: the live links, newest first. */
export const shareListResponseSchema = z.object({ shares: z.array(shareListItemSchema) });

/** GET /api/v1/shared/:token, without sign-in. */
export const sharedDesignSchema = z.object({
  name: z.string(),
  design: storedDesignSchema,
  revision: z.number().int().min(1),
  updatedAt: timestampSchema,
  result: resultSchema.nullable(),
  /** values adopted on the bench, with the calibrated tap they give */
  calibration: calibrationResponseSchema.optional(),
});

export type ShareLink = z.infer<typeof shareLinkSchema>;
export type ShareListItem = z.infer<typeof shareListItemSchema>;
export type ShareListResponse = z.infer<typeof shareListResponseSchema>;
export type SharedDesign = z.infer<typeof sharedDesignSchema>;
