/** Winding sessions at the jig: start, readings (sent from a queue that survives a dropped connection), pauses, finish, adoption. */
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type {
  StartWindingBody,
  WindingAdoptBody,
  WindingAdoptResponse,
  WindingChecklistBody,
  WindingFinishBody,
  WindingPauseBody,
  WindingReadingBody,
  WindingReadingResponse,
  WindingResumeBody,
  WindingSession,
  WindingSessionListResponse,
} from '../contracts';
import { keys } from './keys';

export type { WindingSession };

const sessionPath = (designId: string, sessionId: string, rest = '') => designPath(designId, `/winding/${encodeURIComponent(sessionId)}${rest}`);

/** Puts one session into the cached list, newest first. */
export function storeSession(qc: QueryClient, designId: string, s: WindingSession) {
  qc.setQueryData<WindingSession[]>(keys.winding(designId), (old) => {
    const rest = (old ?? []).filter((x) => x.id !== s.id);
    return [s, ...rest].sort((a, b) => b.startedAt.localeCompare(a.startedAt));
  });
}

/** GET /api/v1/designs/:id/winding, seeded with the sessions the page rendered. */
export function useWindingSessions(designId: string, initial: WindingSession[]) {
  return useQuery({
    queryKey: keys.winding(designId),
    queryFn: () => api.get<WindingSessionListResponse>(designPath(designId, '/winding')).then((r) => r.sessions),
    initialData: initial,
    staleTime: Infinity,
  });
}

/** POST /api/v1/designs/:id/winding/:sessionId/readings: the id made on this device makes a second send harmless. */
export function sendWindingReading(designId: string, sessionId: string, body: WindingReadingBody) {
  return api.post<WindingReadingResponse>(sessionPath(designId, sessionId, '/readings'), body);
}

/** CSV of one session, for a plain download link. */
export const windingCsvPath = (designId: string, sessionId: string) => sessionPath(designId, sessionId, '/export.csv');

function useSessionMutation<B>(designId: string, call: (body: B) => Promise<WindingSession>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: call, onSuccess: (s) => storeSession(qc, designId, s) });
}

/** POST /api/v1/designs/:id/winding */
export function useStartWinding(designId: string) {
  return useSessionMutation(designId, (b: StartWindingBody) => api.post<WindingSession>(designPath(designId, '/winding'), b));
}

/** POST …/pause */
export function usePauseWinding(designId: string, sessionId: string) {
  return useSessionMutation(designId, (b: WindingPauseBody) => api.post<WindingSession>(sessionPath(designId, sessionId, '/pause'), b));
}

/** POST …/resume */
export function useResumeWinding(designId: string, sessionId: string) {
  return useSessionMutation(designId, (b: WindingResumeBody) => api.post<WindingSession>(sessionPath(designId, sessionId, '/resume'), b));
}

/** POST …/finish */
export function useFinishWinding(designId: string, sessionId: string) {
  return useSessionMutation(designId, (b: WindingFinishBody) => api.post<WindingSession>(sessionPath(designId, sessionId, '/finish'), b));
}

/** PUT …/checklist */
export function usePutWindingChecklist(designId: string, sessionId: string) {
  return useSessionMutation(designId, (b: WindingChecklistBody) => api.put<WindingSession>(sessionPath(designId, sessionId, '/checklist'), b));
}

/** POST …/adopt: the design at its new revision comes back with its result. */
export function useAdoptWinding(designId: string, sessionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (b: WindingAdoptBody) => api.post<WindingAdoptResponse>(sessionPath(designId, sessionId, '/adopt'), b),
    onSuccess: (r) => {
      storeSession(qc, designId, r.session);
      void qc.invalidateQueries({ queryKey: keys.design(designId), exact: true });
    },
  });
}
