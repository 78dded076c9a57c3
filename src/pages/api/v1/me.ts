import type { APIRoute } from 'astro';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { getDb } from '../../../server/db';
import { user } from '../../../server/db/schema';
import { handle, readJson, requireUser } from '../../../server/http';
import { parseBody } from '../../../server/services/designs';
import { toSessionUser } from '../../../server/session';
import { markUserChanged } from '../../../server/auth';

export const prerender = false;

const meBody = z
  .object({
    name: z.string().trim().min(1, 'Your name cannot be empty.').max(80, 'Keep your name under 80 characters.').optional(),
    unitSystem: z.enum(['metric', 'imperial'], { error: 'Choose metric or imperial.' }).optional(),
  })
  .strict();

export const GET: APIRoute = handle(async ({ locals }) => Response.json({ user: requireUser(locals) }));

export const PATCH: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const b = parseBody(meBody, await readJson(request));
  const db = getDb();
  if (Object.keys(b).length) {
    await db.update(user).set({ ...b, updatedAt: new Date() }).where(eq(user.id, u.id));
    markUserChanged(u.id);
  }
  const row = await db.query.user.findFirst({ where: eq(user.id, u.id) });
  return Response.json({ user: toSessionUser(row as unknown as Record<string, unknown>) });
});
