import { errorMessages } from './errors';
import { apiErrorCodes, type ApiErrorCode } from './api/contracts/errors';

export type { ApiErrorBody, ApiErrorCode, ApiIssue } from './api/contracts/errors';

/** The words of each /api/v1 error code (the codes are listed in the contract), from the one map in errors.ts. */
export const apiErrors = Object.fromEntries(apiErrorCodes.map((c) => [c, errorMessages[c]])) as Record<ApiErrorCode, string>;
