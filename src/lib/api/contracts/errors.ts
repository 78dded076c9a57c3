import { z } from 'zod';
/** The stable error codes of the /api/v1 endpoints; their words are in lib/errors.ts. */
export const apiErrorCodes = [
  'validation_failed',
  'invalid_json',
  'unauthorized',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  'rate_limited',
  'email_not_verified',
  'unsupported_media_type',
  'internal_error',
] as const;

export const apiErrorCodeSchema = z.enum(apiErrorCodes);

export const apiIssueSchema = z.object({
  /** dotted path of the field, e.g. "secondary.turns"; "" for the body as a whole */
  path: z.string(),
  message: z.string(),
});

/**
 * The body of every failed /api/v1 request: `{ error: { code, message, issues } }`. A conflict (409) on a save
 * also carries `latestRevision`.
 */
export const apiErrorBodySchema = z
  .object({
    error: z.looseObject({
      code: apiErrorCodeSchema,
      message: z.string(),
      issues: z.array(apiIssueSchema).optional(),
      latestRevision: z.number().int().optional(),
    }),
  })
  .meta({ id: 'Error' });

export type ApiErrorCode = z.infer<typeof apiErrorCodeSchema>;
export type ApiIssue = z.infer<typeof apiIssueSchema>;
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
