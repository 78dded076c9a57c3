import type { ErrorLike } from '~/lib/errors';

import type { UnitSystem } from '~/lib/format';

export type { UnitSystem };
export type MePatch = { unitSystem?: UnitSystem; name?: string };

export type ApiIssue = { path: string; message: string };
export type ApiFailure = ErrorLike & { issues?: ApiIssue[] };
export type UpdateMeResult = { ok: true } | { ok: false; error: ApiFailure };

/** PATCH /api/v1/me. Never throws for an HTTP error: the caller shows the message. */
export async function updateMe(patch: MePatch): Promise<UpdateMeResult> {
  const res = await fetch('/api/v1/me', {
    method: 'PATCH',
    headers: { 'content-type': 'application/json', accept: 'application/json' },
    credentials: 'same-origin',
    body: JSON.stringify(patch),
  });
  if (res.ok) return { ok: true };
  let error: ApiFailure = { status: res.status };
  try {
    const body: unknown = await res.json();
    if (body && typeof body === 'object' && 'error' in body && body.error && typeof body.error === 'object') {
      error = { ...(body.error as ApiFailure), status: res.status };
    }
  } catch {
    // A body that is not JSON still leaves the status to explain the failure.
  }
  return { ok: false, error };
}
