import type { DesignInput } from '../design';
import type { Result } from '../../solver/types';

import type { DesignRole } from '../permissions';

export type { DesignRole };

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
