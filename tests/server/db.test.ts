import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { count } from 'drizzle-orm';
import { openDb, prepareDb } from '../../src/server/db/client';
import { designs, user, designRevisions, groups, groupMembers, reviews, measurements } from '../../src/server/db/schema';
import { seedDemo } from '../../scripts/seed-demo';

describe('openDb / prepareDb', () => {
  it('a file database gets WAL, foreign keys and every migration, in a folder it creates', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-db-'));
    try {
      const url = `file:${join(dir, 'nested/folder/app.db')}`;
      const db = openDb(url);
      await prepareDb(db, url);
      const mode = await db.$client.execute('PRAGMA journal_mode');
      expect(String(mode.rows[0][0])).toBe('wal');
      const fk = await db.$client.execute('PRAGMA foreign_keys');
      expect(Number(fk.rows[0][0])).toBe(1);
      const tables = (await db.$client.execute("select name from sqlite_master where type='table'")).rows.map((r) => String(r[0]));
      for (const t of ['user', 'session', 'account', 'verification', 'designs', 'design_revisions', 'design_members', 'design_shares', 'measurements', 'attachments']) {
        expect(tables).toContain(t);
      }
      await prepareDb(db, url); // applying the migrations again is harmless
      db.$client.close();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('a design row cannot point at a missing owner (foreign keys enforced)', async () => {
    const db = openDb(':memory:');
    await prepareDb(db, ':memory:');
    await expect(db.insert(designs).values({ id: 'd1', ownerId: 'nobody', name: 'x', design: { secondary: { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' } } } })).rejects.toThrow();
  });
});

describe('seedDemo', () => {
  it('seeds the demo scenario once; a second run changes nothing', async () => {
    const db = openDb(':memory:');
    await prepareDb(db, ':memory:');
    const first = await seedDemo(db);
    expect(first.created).toBe(true);
    const countsOf = async () => ({
      users: (await db.select({ n: count() }).from(user))[0].n,
      designs: (await db.select({ n: count() }).from(designs))[0].n,
      revisions: (await db.select({ n: count() }).from(designRevisions))[0].n,
      groups: (await db.select({ n: count() }).from(groups))[0].n,
      groupMembers: (await db.select({ n: count() }).from(groupMembers))[0].n,
      reviews: (await db.select({ n: count() }).from(reviews))[0].n,
      measurements: (await db.select({ n: count() }).from(measurements))[0].n,
    });
    const before = await countsOf();
    expect(before.users).toBe(4);
    expect(before.groups).toBe(1);
    expect(before.groupMembers).toBe(3);
    expect((await db.select({ s: reviews.state }).from(reviews)).map((r) => r.s).sort()).toEqual(['changes_requested', 'signed_off']);
    expect(before.designs).toBe(3);
    // every demo design carries a bench history, the bridge-driven coil its own kinds too
    const kinds = (await db.select({ designId: measurements.designId, kind: measurements.kind }).from(measurements)).map((m) => m);
    expect(new Set(kinds.map((k) => k.designId)).size).toBe(3);
    for (const k of ['primary-ring-frequency', 'peak-primary-current', 'trip-setting']) expect(kinds.map((m) => m.kind)).toContain(k);
    const second = await seedDemo(db);
    expect(second.created).toBe(false);
    expect(await countsOf()).toEqual(before);
  });
});
