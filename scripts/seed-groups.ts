/**
 * The demo scenario's coil group as a Coilwright group (invented people): Noor runs it, Oriel Dunmore is the
 * supervisor who reviews before first light, Juno builds. One design is signed off, the other has changes
 * requested. Idempotent: once the group exists, nothing changes.
 */
import { and, eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { Db } from '../src/server/db/client';
import { designs, groupMembers, groups, reviewFindings, reviews } from '../src/server/db/schema';
import { firstLightChecklist } from '../src/lib/review/checklist';

export const demoGroupName = 'Harbour Lane coil club';

type Ids = { admin: string; supervisor: string; member: string };

export async function seedDemoGroup(db: Db, ids: Ids, designNames: readonly [string, string]): Promise<{ created: boolean }> {
  const existing = await db.query.groups.findFirst({ where: and(eq(groups.name, demoGroupName), eq(groups.createdBy, ids.admin)) });
  if (existing) return { created: false };
  const groupId = randomUUID();
  const [signedName, changesName] = designNames;
  const signed = await db.query.designs.findFirst({ where: and(eq(designs.ownerId, ids.admin), eq(designs.name, signedName)) });
  const changes = await db.query.designs.findFirst({ where: and(eq(designs.ownerId, ids.admin), eq(designs.name, changesName)) });
  await db.transaction(async (tx) => {
    await tx.insert(groups).values({ id: groupId, name: demoGroupName, createdBy: ids.admin });
    await tx.insert(groupMembers).values([
      { groupId, userId: ids.admin, role: 'admin' },
      { groupId, userId: ids.supervisor, role: 'supervisor' },
      { groupId, userId: ids.member, role: 'member' },
    ]);
    for (const d of [signed, changes]) if (d) await tx.update(designs).set({ groupId }).where(eq(designs.id, d.id));
    const day = (n: number) => new Date(Date.UTC(2026, 2, n, 18, 30));
    if (signed) {
      const id = randomUUID();
      const items = firstLightChecklist(signed.design).items;
      await tx.insert(reviews).values({ id, designId: signed.id, revision: signed.revision, state: 'signed_off', requestedBy: ids.admin, decidedBy: ids.supervisor, requestNote: 'Ready for the open-day test run.', decisionNote: 'Walked through on the bench with Noor; fine to power up with two people present.', requestedAt: day(10), decidedAt: day(12) });
      await tx.insert(reviewFindings).values(items.map((i) => ({ reviewId: id, item: i.key, status: 'ok' as const, note: '' })));
    }
    if (changes) {
      const id = randomUUID();
      const items = firstLightChecklist(changes.design).items;
      await tx.insert(reviews).values({ id, designId: changes.id, revision: changes.revision, state: 'changes_requested', requestedBy: ids.member, decidedBy: ids.supervisor, requestNote: 'First light planned for next club night.', decisionNote: 'Nearly there; one change before first light.', requestedAt: day(14), decidedAt: day(15) });
      await tx.insert(reviewFindings).values(
        items.map((i) => (i.key === 'bleeders' || i.key === 'bus-discharge'
          ? { reviewId: id, item: i.key, status: 'change' as const, note: 'Two capacitors in the bank have no bleeder fitted yet; fit and measure them all.' }
          : { reviewId: id, item: i.key, status: 'ok' as const, note: '' })),
      );
    }
  });
  return { created: true };
}
