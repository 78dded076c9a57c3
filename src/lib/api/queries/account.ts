/** The signed-in person's own settings: PATCH /api/v1/me. */
import { useMutation } from '@tanstack/react-query';
import type { UnitSystem } from '../../format';
import { api } from '../client';

export type MePatch = { unitSystem?: UnitSystem; name?: string };

export const updateMe = (patch: MePatch) => api.patch<unknown>('/api/v1/me', patch);

/** PATCH /api/v1/me */
export function useUpdateMe() {
  return useMutation({ mutationFn: updateMe });
}
