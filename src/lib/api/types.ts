import type { DesignInput } from '../design';
import type { Result } from '../../solver/types';

export type DesignRole = 'owner' | 'editor' | 'viewer' | 'admin';

/** A design as GET /api/v1/designs/:id returns it. */
export interface DesignRecord {
  id: string;
  name: string;
  design: DesignInput;
  revision: number;
  role: DesignRole;
  updatedAt?: string;
  result: Result | null;
}
