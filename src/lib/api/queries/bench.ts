/** The bench: measurements of a built coil, the calibration adopted from them, photos and instrument files. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type {
  Attachment,
  AttachmentListResponse,
  CalibrationBody,
  CalibrationResponse,
  Measurement,
  MeasurementBody,
  MeasurementListResponse,
  UploadedAttachment,
} from '../contracts';
import { keys } from './keys';

export type MeasurementRow = Measurement;
export type CalibrationView = CalibrationResponse;
export type NewMeasurement = MeasurementBody;
export type AttachmentItem = Attachment;

const byDate = (rows: MeasurementRow[]) => [...rows].sort((a, b) => a.measuredAt.localeCompare(b.measuredAt));

/** GET /api/v1/designs/:id/measurements, seeded with the rows the page rendered. */
export function useMeasurements(designId: string, initial?: MeasurementRow[]) {
  return useQuery({
    queryKey: keys.measurements(designId),
    queryFn: () => api.get<MeasurementListResponse>(designPath(designId, '/measurements')).then((r) => byDate(r.measurements)),
    initialData: initial ? byDate(initial) : undefined,
  });
}

/** POST /api/v1/designs/:id/measurements */
export function useCreateMeasurement(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (m: NewMeasurement) => api.post<MeasurementRow>(designPath(designId, '/measurements'), m),
    onSuccess: (row) => qc.setQueryData<MeasurementRow[]>(keys.measurements(designId), (old) => byDate([...(old ?? []), row])),
  });
}

/** DELETE /api/v1/designs/:id/measurements/:mid */
export function useDeleteMeasurement(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(designPath(designId, `/measurements/${encodeURIComponent(id)}`)),
    onSuccess: (_r, id) => qc.setQueryData<MeasurementRow[]>(keys.measurements(designId), (old) => (old ?? []).filter((x) => x.id !== id)),
  });
}

/** PUT /api/v1/designs/:id/calibration: a measured value adopted in place of the prediction, or null to drop it. */
export function usePutCalibration(designId: string) {
  return useMutation({ mutationFn: (body: CalibrationBody) => api.put<CalibrationView>(designPath(designId, '/calibration'), body) });
}

/** GET /api/v1/designs/:id/attachments is rendered by the page; this cache starts from it. */
export function useAttachments(designId: string, initial: AttachmentItem[]) {
  return useQuery({
    queryKey: keys.attachments(designId),
    queryFn: () => api.get<AttachmentListResponse>(designPath(designId, '/attachments')).then((r) => r.attachments),
    initialData: initial,
    staleTime: Infinity,
  });
}

/** POST /api/v1/designs/:id/attachments (multipart) */
export function useUploadAttachment(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData();
      body.set('file', file);
      return api.post<UploadedAttachment>(designPath(designId, '/attachments'), body);
    },
    onSuccess: (item) => qc.setQueryData<AttachmentItem[]>(keys.attachments(designId), (old) => [item, ...(old ?? [])]),
  });
}

/** DELETE /api/v1/attachments/:id */
export function useDeleteAttachment(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/api/v1/attachments/${encodeURIComponent(id)}`),
    onSuccess: (_r, id) => qc.setQueryData<AttachmentItem[]>(keys.attachments(designId), (old) => (old ?? []).filter((x) => x.id !== id)),
  });
}
