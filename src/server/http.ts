import { apiErrors, type ApiErrorCode, type ApiIssue } from '../lib/api-errors';

const statusOf: Record<ApiErrorCode, number> = {
  validation_failed: 400,
  invalid_json: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 400,
  rate_limited: 429,
  email_not_verified: 403,
  internal_error: 500,
};

export class ApiError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    message?: string,
    readonly issues?: ApiIssue[],
    readonly extra?: Record<string, unknown>,
  ) {
    super(message ?? apiErrors[code]);
  }
}

export function errorResponse(code: ApiErrorCode, message?: string, issues?: ApiIssue[], extra?: Record<string, unknown>): Response {
  return Response.json(
    { error: { code, message: message ?? apiErrors[code], ...(issues ? { issues } : {}), ...(extra ?? {}) } },
    { status: statusOf[code] },
  );
}

/** Wraps a handler: ApiErrors become the contract's JSON; anything else is logged and answered without a stack trace. */
export function handle<C>(fn: (ctx: C) => Promise<Response> | Response) {
  return async (ctx: C): Promise<Response> => {
    try {
      return await fn(ctx);
    } catch (e) {
      if (e instanceof ApiError) return errorResponse(e.code, e.message, e.issues, e.extra);
      console.error('[api]', e);
      return errorResponse('internal_error');
    }
  };
}

const MAX_JSON = 1_000_000;

export async function readJson(request: Request, limit = MAX_JSON): Promise<unknown> {
  const len = Number(request.headers.get('content-length') ?? '0');
  if (len > limit) throw new ApiError('payload_too_large', `The request body is larger than ${Math.round(limit / 1000)} kB.`);
  const text = await request.text();
  if (text.length > limit) throw new ApiError('payload_too_large', `The request body is larger than ${Math.round(limit / 1000)} kB.`);
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError('invalid_json');
  }
}

export function requireUser(locals: App.Locals) {
  if (!locals.user) throw new ApiError('unauthorized');
  return locals.user;
}
