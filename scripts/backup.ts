/**
 * npm run backup: a consistent copy of the SQLite database while the app keeps serving.
 *   npm run backup                       → DATA_DIR/backups/coilwright-<UTC time>.db
 *   npm run backup -- --out FILE         → FILE
 *   npm run backup -- --restore FILE     → replaces the database at DATABASE_URL with FILE (stop the app first)
 * The copy is SQLite's `VACUUM INTO` (sqlite.org/lang_vacuum.html#vacuuminto): it reads one snapshot in a
 * single read transaction, so saves that land meanwhile are either wholly in the copy or not at all, and in
 * WAL mode it does not block them. Prints the file written on stdout.
 */
import { createClient } from '@libsql/client';
import { existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { env } from '../src/server/env';

function localFile(url: string): string {
  if (!url.startsWith('file:') || url.includes(':memory:')) {
    throw new Error(`DATABASE_URL ${url} is not a local file; back up a remote libSQL server with its own tools.`);
  }
  return resolve(url.slice('file:'.length));
}

const quote = (p: string) => `'${p.replace(/'/g, "''")}'`;

function stamp(d = new Date()): string {
  return d.toISOString().replace(/[-:]/g, '').replace(/\.\d+Z$/, 'Z').replace('T', '-');
}

export async function backup(databaseUrl: string, out: string): Promise<string> {
  const source = localFile(databaseUrl);
  if (!existsSync(source)) throw new Error(`no database at ${source}`);
  const target = resolve(out);
  if (existsSync(target)) throw new Error(`${target} exists already; choose another name`);
  mkdirSync(dirname(target), { recursive: true });
  const db = createClient({ url: `file:${source}` });
  try {
    await db.execute('PRAGMA busy_timeout = 5000');
    await db.execute(`VACUUM INTO ${quote(target)}`);
  } finally {
    db.close();
  }
  const check = createClient({ url: `file:${target}` });
  try {
    const r = await check.execute('PRAGMA integrity_check');
    const verdict = String(Object.values(r.rows[0] ?? {})[0]);
    if (verdict !== 'ok') throw new Error(`the copy failed its integrity check: ${verdict}`);
  } finally {
    check.close();
  }
  return target;
}

/** Replaces the database file with a backup (the app must be stopped): copy beside it, then rename over it. */
export async function restore(databaseUrl: string, from: string): Promise<string> {
  const target = localFile(databaseUrl);
  const backupFile = resolve(from);
  if (!existsSync(backupFile)) throw new Error(`no backup at ${backupFile}`);
  mkdirSync(dirname(target), { recursive: true });
  const staging = `${target}.restoring`;
  rmSync(staging, { force: true });
  await backup(`file:${backupFile}`, staging);
  for (const side of ['-wal', '-shm', '-journal']) rmSync(target + side, { force: true });
  renameSync(staging, target);
  return target;
}

async function main() {
  const args = process.argv.slice(2);
  const e = env();
  const at = (flag: string) => {
    const i = args.indexOf(flag);
    return i >= 0 ? args[i + 1] : undefined;
  };
  const from = at('--restore');
  if (from) {
    console.log(await restore(e.DATABASE_URL, from));
    return;
  }
  const out = at('--out') ?? resolve(e.DATA_DIR, 'backups', `coilwright-${stamp()}.db`);
  console.log(await backup(e.DATABASE_URL, out));
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  main().catch((err) => {
    console.error(`[backup] ${err instanceof Error ? err.message : err}`);
    process.exit(1);
  });
}
