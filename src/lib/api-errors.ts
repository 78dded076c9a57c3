/** Stable error codes of the /api/v1 endpoints, with the plain words shown to people. */
export const apiErrors = {
  validation_failed: 'Some fields need attention.',
  invalid_json: 'The request body is not valid JSON.',
  unauthorized: 'Sign in to do this.',
  forbidden: 'Your role on this design does not allow this.',
  not_found: 'Not found.',
  conflict: 'Someone saved a newer revision of this design; reload it or save yours as a copy.',
  payload_too_large: 'The upload is too large.',
  rate_limited: 'Too many requests; wait a minute and try again.',
  email_not_verified: 'Confirm your e-mail address first (see Account) to invite collaborators.',
  unsupported_media_type: 'This kind of file is not accepted here.',
  internal_error: 'Something went wrong on our side; nothing was changed.',
} as const;

export type ApiErrorCode = keyof typeof apiErrors;

export type ApiIssue = { path: string; message: string };

export type ApiErrorBody = { error: { code: ApiErrorCode; message: string; issues?: ApiIssue[] } };
