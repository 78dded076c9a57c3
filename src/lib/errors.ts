/**
 * Every error a person can meet, as stable lower_snake codes with the words we show for them.
 * The API returns these codes in `{ error: { code, message } }`; forms turn better-auth's UPPER_SNAKE codes
 * into the same keys, so one message reads the same wherever it appears.
 */
export const errorMessages = {
  // accounts and sign-in
  user_already_exists: 'An account with this e-mail already exists. Sign in instead, or reset your password.',
  user_already_exists_use_another_email: 'An account with this e-mail already exists. Sign in instead, or reset your password.',
  invalid_email_or_password: 'Wrong e-mail or password.',
  invalid_email: 'Enter a valid e-mail address.',
  invalid_password: 'The current password is wrong.',
  password_too_short: 'The password must be at least 8 characters.',
  password_too_long: 'The password can be at most 128 characters.',
  invalid_token: 'This link is not valid any more. Ask for a new one.',
  token_expired: 'This link has expired. Ask for a new one.',
  email_not_verified: 'Confirm your e-mail address first: follow the link in the message we sent you.',
  email_already_verified: 'This e-mail address is already confirmed.',
  banned_user: 'This account is disabled. Ask an administrator of this site.',
  session_expired: 'Your session has expired. Sign in again.',
  credential_account_not_found: 'This account has no password yet. Use “Forgot password” to set one.',
  user_not_found: 'No such user.',
  // administration
  you_cannot_ban_yourself: 'You cannot disable your own account.',
  you_are_not_allowed_to_change_users_role: 'Only administrators can change roles.',
  you_are_not_allowed_to_ban_users: 'Only administrators can disable accounts.',
  you_are_not_allowed_to_list_users: 'Only administrators can see the user list.',
  // the API's own codes
  validation_failed: 'Some fields need attention.',
  unauthorized: 'Sign in to continue.',
  forbidden: 'You are not allowed to do that.',
  not_found: 'Not found.',
  conflict: 'Someone saved a newer version in the meantime. Reload to see it, then make your change again.',
  payload_too_large: 'That is too large to upload.',
  too_many_requests: 'Too many attempts; wait a minute and try again.',
  rate_limited: 'Too many requests; wait a minute and try again.',
  invalid_json: 'The request body is not valid JSON.',
  unsupported_media_type: 'This kind of file is not accepted here.',
  internal_error: 'Something went wrong on our side; nothing was changed.',
  // the connection itself
  network_error: 'Could not reach Coilwright. Check the connection and try again.',
  bad_response: 'The server sent an answer that could not be read. Reload the page to see where things stand.',
  unknown: 'Something went wrong. Try again; if it keeps happening, tell the site administrator.',
} as const satisfies Record<string, string>;

export type ErrorCode = keyof typeof errorMessages;

/** What better-auth's client calls and our API both return as `error`. */
export type ErrorLike = {
  code?: string | null;
  message?: string | null;
  status?: number | null;
};

export function isErrorCode(code: string): code is ErrorCode {
  return Object.prototype.hasOwnProperty.call(errorMessages, code);
}

/** Maps a code in either spelling (USER_ALREADY_EXISTS or user_already_exists) to ours, when we know it. */
export function toErrorCode(code: string | null | undefined): ErrorCode | null {
  if (!code) return null;
  const key = code.trim().toLowerCase();
  return isErrorCode(key) ? key : null;
}

function byStatus(status: number | null | undefined): ErrorCode | null {
  switch (status) {
    case 401:
      return 'unauthorized';
    case 403:
      return 'forbidden';
    case 404:
      return 'not_found';
    case 409:
      return 'conflict';
    case 413:
      return 'payload_too_large';
    case 429:
      return 'too_many_requests';
    default:
      return null;
  }
}

/** Plain words for an error from a better-auth client call. Rate limiting wins over whatever code came with it. */
export function authErrorMessage(err: ErrorLike | null | undefined): string {
  if (!err) return errorMessages.unknown;
  if (err.status === 429) return errorMessages.too_many_requests;
  const code = toErrorCode(err.code);
  if (code) return errorMessages[code];
  const status = byStatus(err.status);
  if (status) return errorMessages[status];
  return errorMessages.unknown;
}

/** Plain words for an `{ error }` body from /api/v1: our code's message first, then the server's own text. */
export function apiErrorMessage(err: ErrorLike | null | undefined): string {
  if (!err) return errorMessages.unknown;
  if (err.status === 429) return errorMessages.too_many_requests;
  const code = toErrorCode(err.code);
  if (code && code !== 'validation_failed') return errorMessages[code];
  if (err.message) return err.message;
  if (code) return errorMessages[code];
  return errorMessages[byStatus(err.status) ?? 'unknown'];
}
