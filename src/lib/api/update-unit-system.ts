import type { UnitSystem } from '../format';
import { apiRequest } from './request';

/** PATCH /api/v1/me { unitSystem }: stores the signed-in user's choice of display units. */
export async function updateUnitSystem(unitSystem: UnitSystem): Promise<void> {
  await apiRequest<unknown>('PATCH', '/api/v1/me', { unitSystem });
}
