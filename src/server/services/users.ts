import { eq } from 'drizzle-orm';
import type { z } from 'zod';
import { database } from './database';
import { user } from '../db/schema';
import type { SessionUser, updateMeBodySchema } from '../../lib/api/contracts';
import { ApiError } from '../http';
import { toSessionUser } from '../session';
import { markUserChanged } from '../auth/freshness';

/** Changes the signed-in user's name or unit preference (only the fields given) and answers with the stored user. */
export async function updateMe(u: SessionUser, changes: z.output<typeof updateMeBodySchema>): Promise<SessionUser> {
  const db = database();
  if (Object.keys(changes).length) {
    await db.update(user).set({ ...changes, updatedAt: new Date() }).where(eq(user.id, u.id));
    markUserChanged(u.id); // the signed session cookie copies still hold the old values
  }
  const row = await db.query.user.findFirst({ where: eq(user.id, u.id) });
  if (!row) throw new ApiError('unauthorized');
  return toSessionUser(row);
}
