import { call } from '~/lib/library/api-call';

import type { DesignRole } from '~/lib/permissions';

export type LibraryRole = DesignRole;
export type LibraryRow = {
  id: string;
  name: string;
  role: LibraryRole;
  revision: number;
  updatedAt: string;
  loadedFrequency: number | null;
  tapTurns: number | null;
};

export const listDesigns = () => call<{ designs: LibraryRow[] }>('GET', '/api/v1/designs');

/** A rename is a save like any other: it needs the latest revision and becomes a new revision. */
export async function renameDesign(id: string, name: string) {
  const cur = await call<{ design: unknown; revision: number }>('GET', `/api/v1/designs/${id}`);
  if (!cur.ok) return cur;
  return call<{ revision: number }>('PUT', `/api/v1/designs/${id}`, { name, design: cur.data.design, revision: cur.data.revision, message: `Renamed to “${name}”` });
}

export const duplicateDesign = (id: string) => call<{ id: string; name: string }>('POST', `/api/v1/designs/${id}/duplicate`);
export const deleteDesign = (id: string) => call<void>('DELETE', `/api/v1/designs/${id}`);
export const importDesign = (file: unknown) => call<{ id: string; name: string }>('POST', '/api/v1/designs/import', file);
