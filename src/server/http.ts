import { plainMessage } from '../lib/design/labels';
import type { z } from 'zod';
import { apiErrors } from '../lib/api-errors';
import type { ApiErrorCode, ApiIssue } from '../lib/api/contracts/errors';

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

/** The largest JSON body a route reads, in bytes. */
export const MAX_JSON = 1_000_000;

/** The 413 of a body over `limit` bytes. */
export function payloadTooLarge(limit = MAX_JSON): ApiError {
  return new ApiError('payload_too_large', `The request body is larger than ${Math.round(limit / 1000)} kB.`);
}

export async function readJson(request: Request, limit = MAX_JSON): Promise<unknown> {
  const len = Number(request.headers.get('content-length') ?? '0');
  if (len > limit) throw payloadTooLarge(limit);
  const text = await request.text();
  if (text.length > limit) throw payloadTooLarge(limit);
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError('invalid_json');
  }
}

/** A JSON body that may be left out entirely (an empty body reads as undefined); anything sent must be JSON. */
export async function readOptionalJson(request: Request, limit?: number): Promise<unknown> {
  const text = await request.clone().text();
  if (text.trim() === '') return undefined;
  return readJson(request, limit);
}

/** zod's issues in the contract's shape: a dotted path and a message. */
export function issuesOf(error: z.ZodError): ApiIssue[] {
  return error.issues.map((i) => ({ path: i.path.join('.'), message: plainMessage(i.message) }));
}

/** Checks a value against a contract schema; a mismatch is a 400 naming every field. */
export function parseValue<T extends z.ZodType>(schema: T, value: unknown, message = 'Some fields need attention.'): z.output<T> {
  const r = schema.safeParse(value);
  if (!r.success) throw new ApiError('validation_failed', message, issuesOf(r.error));
  return r.data;
}

export type BodyOptions = {
  /** largest body in bytes (default 1 MB) */
  limit?: number;
  /** an empty body reads as undefined instead of invalid JSON */
  optional?: boolean;
};

/** Reads a request's JSON body and checks it against a contract schema: the one place request bodies are parsed. */
export async function parseBody<T extends z.ZodType>(request: Request, schema: T, options: BodyOptions = {}): Promise<z.output<T>> {
  const raw = options.optional ? await readOptionalJson(request, options.limit) : await readJson(request, options.limit);
  return parseValue(schema, raw);
}

/** Checks a URL's query against a contract schema; parameters left empty count as absent. */
export function parseQuery<T extends z.ZodType>(url: URL, schema: T, message = 'Some parameters need attention.'): z.output<T> {
  const raw: Record<string, string> = {};
  for (const [key, value] of url.searchParams) if (value !== '') raw[key] = value;
  return parseValue(schema, raw, message);
}

/** Checks a path parameter; one that cannot name anything is a 404 like an unknown one. */
export function parseParam<T extends z.ZodType>(raw: string | undefined, schema: T, notFound: string): z.output<T> {
  const r = schema.safeParse(raw);
  if (!r.success) throw new ApiError('not_found', notFound);
  return r.data;
}

export function requireUser(locals: App.Locals) {
  if (!locals.user) throw new ApiError('unauthorized');
  return locals.user;
}
