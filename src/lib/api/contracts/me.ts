import { z } from 'zod';
import { UNIT_SYSTEMS } from '../../format/length';

export const unitSystemSchema = z.enum(UNIT_SYSTEMS, { error: 'Choose metric or imperial.' });
export const siteRoleSchema = z.enum(['admin', 'member']);

/** The signed-in person as every page and endpoint sees them. */
export const sessionUserSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  emailVerified: z.boolean(),
  role: siteRoleSchema,
  unitSystem: unitSystemSchema,
});

/** GET and PATCH /api/v1/me */
export const meResponseSchema = z.object({ user: sessionUserSchema });

/** PATCH /api/v1/me: only the fields given change. */
export const updateMeBodySchema = z
  .object({
    name: z.string().trim().min(1, 'Your name cannot be empty.').max(80, 'Keep your name under 80 characters.').optional(),
    unitSystem: unitSystemSchema.optional(),
  })
  .strict();

export type SessionUser = z.infer<typeof sessionUserSchema>;
export type MeResponse = z.infer<typeof meResponseSchema>;
export type UpdateMeBody = z.input<typeof updateMeBodySchema>;
export type { UnitSystem } from '../../format/length';
