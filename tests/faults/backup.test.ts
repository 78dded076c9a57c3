import { afterAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { createClient } from '@libsql/client';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { toroidCoil } from '../api/designs-fixtures';
import { createDesign, signUp as signedUp } from '../helpers/accounts';

const root = resolve(import.meta.dirname, '../..');
const cleanup: Array<() => Promise<void> | void> = [];
afterAll(async () => {
  for (const f of cleanup.reverse()) await f();
});

function run(args: string[], dataDir: string) {
  const r = spawnSync(process.execPath, [join(root, 'node_modules/tsx/dist/cli.mjs'), join(root, 'scripts/backup.ts'), ...args], {
    cwd: root,
    env: { ...process.env, DATA_DIR: dataDir, DATABASE_URL: `file:${join(dataDir, 'test.db')}` },
    encoding: 'utf8',
  });
  return { status: r.status, out: r.stdout.trim(), err: r.stderr };
}

const withTurns = (turns: number) => ({ ...toroidCoil, secondary: { ...toroidCoil.secondary, turns } });

describe('npm run backup', () => {
  it('copies the database consistently while saves go on, and a restore brings back exactly that state', { timeout: 180_000 }, async () => {
    const s: TestServer = await startServer({}, { keepData: true });
    cleanup.push(() => rmSync(s.dataDir, { recursive: true, force: true }));
    cleanup.push(() => s.stop());
    const u = await signedUp(s.url, 'Backup Bea');
    const { id } = await createDesign(u.c, 'Kept coil');
    for (let rev = 1; rev <= 5; rev++) expect((await u.c.put(`/api/v1/designs/${id}`, { design: withTurns(800 + rev), revision: rev })).status).toBe(200);

    // Saves keep landing on another design while the backup runs.
    const { id: busy } = await createDesign(u.c, 'Busy coil');
    let stop = false;
    let busyRevision = 1;
    const saving = (async () => {
      while (!stop) {
        const r = await u.c.put(`/api/v1/designs/${busy}`, { design: withTurns(600 + busyRevision), revision: busyRevision });
        expect(r.status).toBe(200);
        busyRevision += 1;
      }
    })();
    await new Promise((r) => setTimeout(r, 300));
    const made = run([], s.dataDir);
    stop = true;
    await saving;
    expect(made.status, made.err).toBe(0);
    const file = made.out;
    expect(file).toMatch(/backups[/\\]coilwright-\d{8}-\d{6}Z\.db$/);
    expect(existsSync(file)).toBe(true);

    // The copy is one snapshot: the busy design's row and its revisions agree.
    const copy = createClient({ url: `file:${file}` });
    const head = await copy.execute({ sql: 'SELECT revision FROM designs WHERE id = ?', args: [busy] });
    const revs = await copy.execute({ sql: 'SELECT max(revision) AS m, count(*) AS n FROM design_revisions WHERE design_id = ?', args: [busy] });
    expect(Number(revs.rows[0].m)).toBe(Number(head.rows[0].revision));
    expect(Number(revs.rows[0].n)).toBe(Number(head.rows[0].revision));
    const snapshotBusy = Number(head.rows[0].revision);
    expect((await copy.execute('PRAGMA integrity_check')).rows.map((r) => Object.values(r)[0])).toEqual(['ok']);
    copy.close();

    // After the backup: one more revision and a deletion, which the restore must undo.
    expect((await u.c.put(`/api/v1/designs/${id}`, { name: 'Changed after the backup', design: withTurns(999), revision: 6 })).status).toBe(200);
    expect((await u.c.del(`/api/v1/designs/${busy}`)).status).toBe(204);
    await s.stop();

    const fresh = mkdtempSync(join(tmpdir(), 'coilwright-restore-'));
    cleanup.push(() => rmSync(fresh, { recursive: true, force: true }));
    const restored = run(['--restore', file], fresh);
    expect(restored.status, restored.err).toBe(0);
    const again = await startServer({}, { dataDir: fresh, keepData: true });
    cleanup.push(() => again.stop());
    const c = new Client(again.url);
    await c.signIn(u.email);
    const kept = await (await c.get(`/api/v1/designs/${id}`)).json();
    expect(kept).toMatchObject({ name: 'Kept coil', revision: 6, design: withTurns(805) });
    const back = await c.get(`/api/v1/designs/${busy}`);
    expect(back.status).toBe(200);
    expect((await back.json()).revision).toBe(snapshotBusy);
    expect(snapshotBusy).toBeLessThanOrEqual(busyRevision);
  });

  it('refuses a database that is not a local file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-backup-'));
    cleanup.push(() => rmSync(dir, { recursive: true, force: true }));
    const r = spawnSync(process.execPath, [join(root, 'node_modules/tsx/dist/cli.mjs'), join(root, 'scripts/backup.ts')], {
      cwd: root,
      env: { ...process.env, DATA_DIR: dir, DATABASE_URL: ':memory:' },
      encoding: 'utf8',
    });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/not a local file/);
  });
});
