import type { DesignInput } from '../design';
import { apiRequest } from './request';
import type { DesignRecord } from './types';

export interface CreateDesignBody {
  name: string;
  design: DesignInput;
  message?: string;
}

/** POST /api/v1/designs → 201 with the new design at revision 1. */
export function createDesign(body: CreateDesignBody): Promise<DesignRecord> {
  return apiRequest<DesignRecord>('POST', '/api/v1/designs', body);
}
