import { errorMessages } from './errors';

/** The stable error codes of the /api/v1 endpoints; their words come from the one map in errors.ts. */
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

export type ApiErrorCode = (typeof apiErrorCodes)[number];

export const apiErrors = Object.fromEntries(apiErrorCodes.map((c) => [c, errorMessages[c]])) as Record<ApiErrorCode, string>;

export type ApiIssue = { path: string; message: string };

export type ApiErrorBody = { error: { code: ApiErrorCode; message: string; issues?: ApiIssue[] } };
