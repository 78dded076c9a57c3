import type { ApiIssue } from '../api-errors';

/** A failed /api/v1 call as the UI needs it: status, the contract's code and message, per-field issues. */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: string | null;
  readonly issues: ApiIssue[];
  /** extra members of the error body, e.g. `latestRevision` on a conflict */
  readonly extra: Record<string, unknown>;

  constructor(status: number, code: string | null, message: string, issues: ApiIssue[] = [], extra: Record<string, unknown> = {}) {
    super(message);
    this.name = 'ApiRequestError';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.extra = extra;
  }
}

/** The network itself failed (offline, server down): no status to show. */
export class NetworkError extends Error {
  constructor() {
    super('Could not reach Coilwright. Check the connection and try again.');
    this.name = 'NetworkError';
  }
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

async function errorFrom(res: Response): Promise<ApiRequestError> {
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    // a body that is not JSON still leaves the status to explain the failure
  }
  const e = isRecord(body) && isRecord(body.error) ? body.error : {};
  const { code, message, issues, ...extra } = e;
  const list = Array.isArray(issues)
    ? issues.filter(isRecord).map((i) => ({ path: String(i.path ?? ''), message: String(i.message ?? '') }))
    : [];
  return new ApiRequestError(
    res.status,
    typeof code === 'string' ? code : null,
    typeof message === 'string' && message ? message : `The request failed (HTTP ${res.status}).`,
    list,
    extra,
  );
}

/** JSON request to the app's own API with the session cookie; throws ApiRequestError or NetworkError. */
export async function apiRequest<T>(method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE', path: string, body?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: body === undefined ? { accept: 'application/json' } : { accept: 'application/json', 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new NetworkError();
  }
  if (!res.ok) throw await errorFrom(res);
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}
