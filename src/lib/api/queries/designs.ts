/** Designs: the library list, one design, create, save, rename, duplicate, delete, import, restore, copy of a shared one. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DesignInput } from '../../design';
import { api, designPath } from '../client';
import type { DesignRecord, DesignRole } from '../types';
import { keys } from './keys';

export type LibraryRow = {
  id: string;
  name: string;
  role: DesignRole;
  revision: number;
  updatedAt: string;
  loadedFrequency: number | null;
  tapTurns: number | null;
};

export interface CreateDesignBody {
  name: string;
  design: DesignInput;
  message?: string;
}

export interface UpdateDesignBody {
  name?: string;
  design: DesignInput;
  /** the revision the edit started from; a newer one on the server gives 409 and nothing is overwritten */
  revision: number;
  message?: string;
}

export const getDesign = (id: string) => api.get<DesignRecord>(designPath(id));
export const createDesign = (body: CreateDesignBody) => api.post<DesignRecord>('/api/v1/designs', body);
export const updateDesign = (id: string, body: UpdateDesignBody) => api.put<DesignRecord>(designPath(id), body);

/** GET /api/v1/designs: the signed-in person's library. */
export function useDesignList() {
  return useQuery({ queryKey: keys.designs, queryFn: () => api.get<{ designs: LibraryRow[] }>('/api/v1/designs').then((r) => r.designs) });
}

/** GET /api/v1/designs/:id, seeded with what the page already rendered. */
export function useDesign(id: string | null, initial?: DesignRecord) {
  return useQuery({
    queryKey: keys.design(id ?? 'new'),
    queryFn: () => getDesign(id!),
    enabled: false,
    initialData: initial,
    staleTime: Infinity,
  });
}

/** POST /api/v1/designs */
export function useCreateDesign() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createDesign, onSuccess: () => qc.invalidateQueries({ queryKey: keys.designs, exact: true }) });
}

/** PUT /api/v1/designs/:id with the revision the edit started from; 409 when someone saved meanwhile. */
export function useUpdateDesign(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateDesignBody) => updateDesign(id, body),
    onSuccess: (rec) => qc.setQueryData(keys.design(id), rec),
  });
}

/** A rename is a save like any other: it reads the latest revision and becomes a new revision. */
export function useRenameDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, name }: { id: string; name: string }) => {
      const cur = await getDesign(id);
      return updateDesign(id, { name, design: cur.design, revision: cur.revision, message: `Renamed to “${name}”` });
    },
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** POST /api/v1/designs/:id/duplicate */
export function useDuplicateDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<{ id: string; name: string }>(designPath(id, '/duplicate')),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** DELETE /api/v1/designs/:id */
export function useDeleteDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(designPath(id)),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** POST /api/v1/designs/import with a parsed design file. */
export function useImportDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: unknown) => api.post<{ id: string; name: string }>('/api/v1/designs/import', file),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** POST /api/v1/designs/:id/revisions/:n/restore: an old revision becomes the newest one. */
export function useRestoreRevision(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ revision, latest }: { revision: number; latest: number }) =>
      api.post<{ revision: number }>(designPath(id, `/revisions/${revision}/restore`), { revision: latest }),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.design(id) }),
  });
}

/** POST /api/v1/shared/:token/copy: a read-only shared design copied into the visitor's library. */
export function useCopySharedDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api.post<{ id: string }>(`/api/v1/shared/${encodeURIComponent(token)}/copy`),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** GET a review summary (plain text or Markdown) of a design or of a shared link. */
export function useFetchSummary() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ endpoint, format }: { endpoint: string; format: 'text' | 'markdown' }) =>
      qc.fetchQuery({ queryKey: keys.summary(endpoint, format), queryFn: () => api.get<string>(`${endpoint}?format=${format}`), staleTime: 0 }),
  });
}
