import { apiRequest } from './request';
import type { DesignRecord } from './types';

/** GET /api/v1/designs/:id */
export function getDesign(id: string): Promise<DesignRecord> {
  return apiRequest<DesignRecord>('GET', `/api/v1/designs/${encodeURIComponent(id)}`);
}

export const designQueryKey = (id: string) => ['design', id] as const;
