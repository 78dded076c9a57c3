import { env } from '../env';
import { openDb, prepareDb, type Db } from './client';

// One database per process, shared through globalThis so the start script and the built app use the same one.
const g = globalThis as unknown as { __coilwrightDb?: { db: Db; ready: Promise<void> } };

function instance() {
  if (!g.__coilwrightDb) {
    const e = env();
    const db = openDb(e.DATABASE_URL, e.DATABASE_AUTH_TOKEN);
    g.__coilwrightDb = { db, ready: prepareDb(db, e.DATABASE_URL) };
  }
  return g.__coilwrightDb;
}

export function getDb(): Db {
  return instance().db;
}

/** Resolves once migrations have been applied; awaited before the first request is served. */
export function dbReady(): Promise<void> {
  return instance().ready;
}

export type { Db };
