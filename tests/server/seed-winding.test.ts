import { describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import { openDb, prepareDb } from '../../src/server/db/client';
import { measurements, user, windingReadings, windingSessions } from '../../src/server/db/schema';
import { seedDemo, demoAccounts } from '../../scripts/seed-demo';
import { withDatabase } from '../../src/server/services/database';
import { listWindingSessions } from '../../src/server/services/winding';
import { toSessionUser } from '../../src/server/session';

describe('seedDemo: the winding session', () => {
  it('seedDemo adds one finished session whose counter missed counts, once; a database seeded before sessions existed gets it on the next run', async () => {
    const db = openDb(':memory:');
    await prepareDb(db, ':memory:');
    await seedDemo(db);
    const noor = await db.query.user.findFirst({ where: eq(user.email, demoAccounts.member.email) });
    const owner = toSessionUser(noor as unknown as Record<string, unknown>);
    const sessions = await db.select().from(windingSessions);
    expect(sessions).toHaveLength(1);
    const [view] = (await withDatabase(db, () => listWindingSessions(owner, sessions[0].designId))).sessions;
    expect(view.status).toBe('finished');
    expect(view.designName).toBe('12 kV sign-transformer coil');
    expect(view.woundTurns).toBe(1000);
    const flags = view.readings.filter((r) => r.flag);
    expect(flags.length).toBeGreaterThanOrEqual(2);
    expect(flags.every((r) => r.flag!.direction === 'counter-low')).toBe(true);
    expect(flags.at(-1)).toMatchObject({ counter: 978, flag: { correctedCount: 1000 } });
    expect(view.pauses.map((p) => p.reason)).toEqual(['guide', 'break']);
    expect(view.checklist.coats).toBe(3);
    // the session's own bench-log kinds, once each (the demo designs carry other measurements too)
    const kinds = (await db.select().from(measurements)).map((m) => m.kind).filter((k) => k === 'winding-length' || k === 'wound-turns').sort();
    expect(kinds).toEqual(['winding-length', 'wound-turns']);

    const readingsBefore = (await db.select({ n: count() }).from(windingReadings))[0].n;
    expect((await seedDemo(db)).created).toBe(false);
    expect((await db.select({ n: count() }).from(windingSessions))[0].n).toBe(1);
    expect((await db.select({ n: count() }).from(windingReadings))[0].n).toBe(readingsBefore);

    await db.delete(windingSessions);
    await db.delete(measurements);
    expect((await seedDemo(db)).created).toBe(true);
    expect((await db.select({ n: count() }).from(windingSessions))[0].n).toBe(1);
  });
});
