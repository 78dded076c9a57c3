import type { DesignInput } from '../design';
import { apiRequest } from './request';
import type { DesignRecord } from './types';

export interface UpdateDesignBody {
  name?: string;
  design: DesignInput;
  /** the revision the edit started from; a newer one on the server gives 409 and nothing is overwritten */
  revision: number;
  message?: string;
}

/** PUT /api/v1/designs/:id → the design at its new revision. */
export function updateDesign(id: string, body: UpdateDesignBody): Promise<DesignRecord> {
  return apiRequest<DesignRecord>('PUT', `/api/v1/designs/${encodeURIComponent(id)}`, body);
}
