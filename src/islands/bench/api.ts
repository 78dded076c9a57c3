/** Calls of the bench page's islands. Errors come back as the API's message and per-field issues. */
export type ApiFailure = { ok: false; status: number; message: string; issues: Array<{ path: string; message: string }> };
export type ApiResult<T> = { ok: true; data: T } | ApiFailure;

export async function request<T>(method: string, url: string, body?: unknown): Promise<ApiResult<T>> {
  let r: Response;
  try {
    r = await fetch(url, {
      method,
      headers: body === undefined || body instanceof FormData ? undefined : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, message: 'The server could not be reached; check your connection.', issues: [] };
  }
  if (r.status === 204) return { ok: true, data: undefined as T };
  let json: unknown = null;
  try {
    json = await r.json();
  } catch {
    /* an empty or non-JSON answer */
  }
  if (r.ok) return { ok: true, data: json as T };
  const err = (json as { error?: { message?: string; issues?: Array<{ path: string; message: string }> } } | null)?.error;
  return { ok: false, status: r.status, message: err?.message ?? `The request failed (${r.status}).`, issues: err?.issues ?? [] };
}

export type MeasurementRow = {
  id: string;
  kind: string;
  label: string;
  value: number;
  unit: string;
  measuredAt: string;
  instrument: string | null;
  notes: string | null;
  predicted: number | null;
  errorPercent: number | null;
};

export type CalibrationView = {
  calibration: { loadedFrequency?: number; tankCapacitance?: number; coupling?: number };
  predicted: { loadedFrequency: number | null; tapTurns: number | null };
  calibrated: { targetFrequency: number; tapTurns: number | null; inRange: boolean } | null;
};

export type NewMeasurement = { kind: string; value: number; measuredAt: string; instrument?: string; notes?: string };

export const listMeasurements = (designId: string) => request<{ measurements: MeasurementRow[] }>('GET', `/api/v1/designs/${designId}/measurements`);
export const createMeasurement = (designId: string, m: NewMeasurement) => request<MeasurementRow>('POST', `/api/v1/designs/${designId}/measurements`, m);
export const deleteMeasurement = (designId: string, id: string) => request<void>('DELETE', `/api/v1/designs/${designId}/measurements/${id}`);
export const putCalibration = (designId: string, body: Record<string, number | null>) => request<CalibrationView>('PUT', `/api/v1/designs/${designId}/calibration`, body);
