import { createClient, type Client } from '@libsql/client';
import { drizzle, type LibSQLDatabase } from 'drizzle-orm/libsql';
import { migrate } from 'drizzle-orm/libsql/migrator';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import * as schema from './schema';

export type Db = LibSQLDatabase<typeof schema> & { $client: Client };

function localPath(url: string): string | null {
  if (!url.startsWith('file:')) return null;
  const path = url.slice('file:'.length);
  if (path === '' || path.startsWith(':memory:')) return null;
  return path;
}

/** Opens a libSQL database (file, `:memory:` or a remote libSQL server); file databases get their folder created. */
export function openDb(url: string, authToken?: string): Db {
  const path = localPath(url);
  if (path) mkdirSync(dirname(resolve(path)), { recursive: true });
  const client = createClient({ url, authToken, ...(path ? { timeout: 5000 } : {}) });
  const db = drizzle(client, { schema }) as Db;
  if (path) serializeTransactions(db);
  return db;
}

/**
 * A transaction on a local file takes a pooled connection of its own, and SQLite lets one writer at a time:
 * a second BEGIN from this process while one is open fails at once with SQLITE_BUSY. Transactions of one
 * process therefore run one after another (each still atomic); reads outside transactions go on meanwhile.
 */
function serializeTransactions(db: Db): void {
  const begin = db.transaction.bind(db);
  let tail: Promise<unknown> = Promise.resolve();
  db.transaction = ((fn: Parameters<typeof begin>[0], config?: Parameters<typeof begin>[1]) => {
    const run = tail.then(() => begin(fn, config));
    tail = run.catch(() => undefined);
    return run;
  }) as typeof db.transaction;
}

/** WAL and foreign keys for local databases, then the committed migrations in drizzle/. */
export async function prepareDb(db: Db, url: string, migrationsFolder = resolve(process.cwd(), 'drizzle')): Promise<void> {
  const local = url.startsWith('file:') || url === ':memory:';
  if (localPath(url)) await db.$client.execute('PRAGMA journal_mode = WAL');
  if (local) {
    await db.$client.execute('PRAGMA foreign_keys = ON');
    await db.$client.execute('PRAGMA busy_timeout = 5000');
  }
  await migrate(db, { migrationsFolder });
}

export { schema };
