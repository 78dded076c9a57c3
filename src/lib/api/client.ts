/**
 * The one client of the app's own /api/v1 endpoints in the browser. Every call sends the session cookie,
 * reads `{ error: { code, message, issues } }` on failure and throws an ApiFailure; the words a person sees
 * come from the one map in errors.ts, so an offline or conflict message reads the same on every page.
 */
import type { ApiIssue } from '../api-errors';
import { apiErrorMessage, errorMessages, toErrorCode } from '../errors';

export type ApiMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** A failed call: `status` 0 means the server was not reached at all. */
export class ApiFailure extends Error {
  readonly status: number;
  /** the contract's code (`validation_failed`, `conflict`, …), `network_error` or `bad_response` */
  readonly code: string;
  readonly issues: ApiIssue[];
  /** other members of the error body, e.g. `latestRevision` on a conflict */
  readonly extra: Record<string, unknown>;

  constructor(status: number, code: string, message: string, issues: ApiIssue[] = [], extra: Record<string, unknown> = {}) {
    super(message);
    this.name = 'ApiFailure';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.extra = extra;
  }

  get offline(): boolean {
    return this.status === 0;
  }

  get conflict(): boolean {
    return this.status === 409;
  }

  /** Issues keyed by field path; the first message for a path wins. */
  get byPath(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const i of this.issues) out[i.path] ??= i.message;
    return out;
  }
}

/** Plain words for anything a call may throw. */
export function failureMessage(e: unknown): string {
  if (e instanceof ApiFailure) return e.message;
  return errorMessages.unknown;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

async function failureFrom(res: Response): Promise<ApiFailure> {
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    // a body that is not JSON (a proxy's page, an empty answer) still leaves the status to explain the failure
  }
  const e = isRecord(body) && isRecord(body.error) ? body.error : {};
  const { code, message, issues, ...extra } = e;
  const list: ApiIssue[] = Array.isArray(issues)
    ? issues.filter(isRecord).map((i) => ({ path: String(i.path ?? ''), message: String(i.message ?? '') }))
    : [];
  const rawCode = typeof code === 'string' ? code : null;
  const known = toErrorCode(rawCode);
  const serverText = typeof message === 'string' && message.trim() ? message : null;
  return new ApiFailure(res.status, known ?? rawCode ?? (res.status === 409 ? 'conflict' : 'unknown'), wording(res.status, rawCode, serverText), list, extra);
}

/**
 * The words for a failed call. A conflict, a sign-in or permission problem, rate limiting and any server
 * fault read the same everywhere (errors.ts); a refused request (400, 413, 415, …) keeps the server's own
 * sentence, which names what was wrong with it.
 */
function wording(status: number, code: string | null, serverText: string | null): string {
  if (status === 409) return errorMessages.conflict;
  if (status >= 500) return errorMessages[toErrorCode(code) === 'internal_error' ? 'internal_error' : 'unknown'];
  if ([401, 403, 404, 429].includes(status)) return apiErrorMessage({ code, message: null, status });
  return serverText ?? apiErrorMessage({ code, message: null, status });
}

/**
 * One request to the app's API. `body` is sent as JSON, or as it is when it is FormData.
 * Resolves with the parsed JSON answer (undefined for 204, the text for a non-JSON success); throws ApiFailure.
 */
export async function apiCall<T>(method: ApiMethod, path: string, body?: unknown, init?: { signal?: AbortSignal }): Promise<T> {
  const form = typeof FormData !== 'undefined' && body instanceof FormData;
  const headers: Record<string, string> = { accept: 'application/json' };
  if (body !== undefined && !form) headers['content-type'] = 'application/json';
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers,
      body: body === undefined ? undefined : form ? (body as FormData) : JSON.stringify(body),
      signal: init?.signal,
    });
  } catch (e) {
    if (e instanceof DOMException && e.name === 'AbortError') throw e;
    throw new ApiFailure(0, 'network_error', errorMessages.network_error);
  }
  if (!res.ok) throw await failureFrom(res);
  if (res.status === 204) return undefined as T;
  const type = res.headers.get('content-type') ?? '';
  const text = await res.text();
  if (!type.includes('json')) return text as T;
  try {
    return (text ? JSON.parse(text) : undefined) as T;
  } catch {
    throw new ApiFailure(res.status, 'bad_response', errorMessages.bad_response);
  }
}

export const api = {
  get: <T>(path: string, init?: { signal?: AbortSignal }) => apiCall<T>('GET', path, undefined, init),
  post: <T>(path: string, body?: unknown) => apiCall<T>('POST', path, body),
  put: <T>(path: string, body?: unknown) => apiCall<T>('PUT', path, body),
  patch: <T>(path: string, body?: unknown) => apiCall<T>('PATCH', path, body),
  delete: <T = void>(path: string) => apiCall<T>('DELETE', path),
};

/** Path of a design's own endpoints, with the id escaped. */
export const designPath = (id: string, rest = '') => `/api/v1/designs/${encodeURIComponent(id)}${rest}`;
