/** Designs: the library list, one design, create, save, rename, duplicate, delete, import, restore, copy of a shared one. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type {
  AcceptInvitationResponse,
  CreateDesignBody,
  DesignInput,
  DesignListItem,
  DesignListResponse,
  DesignRecord,
  UpdateDesignBody as UpdateDesignWire,
} from '../contracts';
import { keys } from './keys';

export type LibraryRow = DesignListItem;
/** A save as the designer sends it: the design is the typed input the form produced. */
export type UpdateDesignBody = Omit<UpdateDesignWire, 'design'> & { design: DesignInput };
export type { CreateDesignBody, DesignRecord, AcceptInvitationResponse };

export const getDesign = (id: string) => api.get<DesignRecord>(designPath(id));
export const createDesign = (body: CreateDesignBody) => api.post<DesignRecord>('/api/v1/designs', body);
export const updateDesign = (id: string, body: UpdateDesignBody) => api.put<DesignRecord>(designPath(id), body);

/** GET /api/v1/designs: the signed-in person's library. */
export function useDesignList() {
  return useQuery({ queryKey: keys.designs, queryFn: () => api.get<DesignListResponse>('/api/v1/designs').then((r) => r.designs) });
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

/** Reads the newest stored revision of a design, past whatever the cache holds. */
export function useFetchLatestDesign(id: string | null) {
  const qc = useQueryClient();
  return () => qc.fetchQuery({ queryKey: keys.design(id ?? 'new'), queryFn: () => getDesign(id!), staleTime: 0 });
}

/** POST /api/v1/designs */
export function useCreateDesign() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createDesign, onSuccess: () => qc.invalidateQueries({ queryKey: keys.designs, exact: true }) });
}

/** PUT /api/v1/designs/:id with the revision the edit started from; 409 when someone saved meanwhile. */
export function useUpdateDesign(id: string) {
  const qc = useQueryClient();
  const key = keys.design(id);
  return useMutation({
    mutationFn: (body: UpdateDesignBody) => updateDesign(id, body),
    // the cached design shows the edit at once and goes back to what it was if the save fails
    onMutate: async (body) => {
      await qc.cancelQueries({ queryKey: key });
      const previous = qc.getQueryData<DesignRecord>(key);
      if (previous) qc.setQueryData<DesignRecord>(key, { ...previous, name: body.name ?? previous.name, design: body.design });
      return { previous };
    },
    onError: (_e, _body, ctx) => {
      if (ctx?.previous) qc.setQueryData(key, ctx.previous);
    },
    onSuccess: (rec) => qc.setQueryData(key, rec),
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
    mutationFn: (id: string) => api.post<DesignRecord>(designPath(id, '/duplicate')),
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
    mutationFn: (file: unknown) => api.post<DesignRecord>('/api/v1/designs/import', file),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.designs }),
  });
}

/** POST /api/v1/designs/:id/revisions/:n/restore: an old revision becomes the newest one. */
export function useRestoreRevision(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ revision, latest }: { revision: number; latest: number }) =>
      api.post<DesignRecord>(designPath(id, `/revisions/${revision}/restore`), { revision: latest }),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.design(id) }),
  });
}

/** POST /api/v1/shared/:token/copy: a read-only shared design copied into the visitor's library. */
export function useCopySharedDesign() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api.post<DesignRecord>(`/api/v1/shared/${encodeURIComponent(token)}/copy`),
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
