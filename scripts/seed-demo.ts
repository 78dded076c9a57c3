/**
 * The demo scenario (invented): the Harbour Lane Makerspace coil group, three members building their first
 * coils for the spring open day. Idempotent: running it again changes nothing.
 */
import { eq } from 'drizzle-orm';
import type { Db } from '../src/server/db/client';
import { user, designMembers } from '../src/server/db/schema';
import { createAuth } from '../src/server/auth';
import { createDesign } from '../src/server/services/designs';
import { withDatabase } from '../src/server/services/database';
import { toSessionUser } from '../src/server/session';
import { exampleDesigns } from '../src/lib/design/examples';
import { seedWindingDemo } from './seed-winding';
import { seedDemoGroup } from './seed-groups';

export const demoAccounts = {
  member: { name: 'Noor Achterberg', email: 'noor@harbourlane.example', password: 'spark-gap-2026' },
  admin: { name: 'Teodor Malik', email: 'teodor@harbourlane.example', password: 'topload-admin-2026' },
  helper: { name: 'Juno Halvorsen', email: 'juno@harbourlane.example', password: 'primary-tap-2026' },
  supervisor: { name: 'Oriel Dunmore', email: 'oriel@harbourlane.example', password: 'safety-gap-2026' },
} as const;

async function ensureUser(db: Db, auth: ReturnType<typeof createAuth>, a: { name: string; email: string; password: string }, role: 'admin' | 'member') {
  let row = await db.query.user.findFirst({ where: eq(user.email, a.email) });
  if (!row) {
    await auth.api.signUpEmail({ body: { name: a.name, email: a.email, password: a.password } });
    row = await db.query.user.findFirst({ where: eq(user.email, a.email) });
    await db.update(user).set({ emailVerified: true, role }).where(eq(user.email, a.email));
    row = await db.query.user.findFirst({ where: eq(user.email, a.email) });
    return { row: row!, created: true };
  }
  return { row, created: false };
}

export async function seedDemo(db: Db): Promise<{ created: boolean }> {
  const auth = createAuth({
    db,
    baseURL: 'http://127.0.0.1',
    secret: 'seed-only-secret-not-used-for-sessions-0000',
    trustedOrigins: [],
    send: async () => {},
  });
  const member = await ensureUser(db, auth, demoAccounts.member, 'member');
  await ensureUser(db, auth, demoAccounts.admin, 'admin');
  const helper = await ensureUser(db, auth, demoAccounts.helper, 'member');
  const supervisor = await ensureUser(db, auth, demoAccounts.supervisor, 'member');
  const names = [exampleDesigns[0].name, exampleDesigns[1].name] as const;
  const ids = { admin: member.row.id, supervisor: supervisor.row.id, member: helper.row.id };
  const owner = toSessionUser(member.row as unknown as Record<string, unknown>);
  if (!member.created) {
    // An older demo database gets what was added since, once.
    const wound = await seedWindingDemo(db, owner);
    const grouped = (await seedDemoGroup(db, ids, names)).created;
    return { created: wound || grouped };
  }

  const made: string[] = [];
  for (const ex of exampleDesigns) {
    const d = await withDatabase(db, () => createDesign(owner, { name: ex.name, design: ex.design, message: 'First draft for the open day' }));
    made.push(d.id);
  }
  if (made[1]) await db.insert(designMembers).values({ designId: made[1], userId: helper.row.id, role: 'editor' });
  if (made[0]) await db.insert(designMembers).values({ designId: made[0], userId: helper.row.id, role: 'viewer' });
  await seedWindingDemo(db, owner);
  await seedDemoGroup(db, ids, names);
  return { created: true };
}
