/** Small fetch wrapper for the /api/v1 endpoints used by the library, history and sharing islands; failures become plain words. */
import { apiErrorMessage } from '~/lib/errors';

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; message: string; issues: Array<{ path: string; message: string }> };

export async function call<T>(method: string, path: string, body?: unknown): Promise<ApiResult<T>> {
  let r: Response;
  try {
    r = await fetch(path, {
      method,
      headers: body === undefined ? {} : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, message: 'Could not reach Coilwright. Check the connection and try again.', issues: [] };
  }
  if (r.status === 204) return { ok: true, data: undefined as T };
  const type = r.headers.get('content-type') ?? '';
  if (r.ok) return { ok: true, data: (type.includes('json') ? await r.json() : await r.text()) as T };
  let err: { code?: string; message?: string; issues?: Array<{ path: string; message: string }> } = {};
  try {
    err = ((await r.json()) as { error?: typeof err }).error ?? {};
  } catch {
    /* not JSON */
  }
  return { ok: false, status: r.status, message: apiErrorMessage({ code: err.code, message: err.message, status: r.status }), issues: err.issues ?? [] };
}
