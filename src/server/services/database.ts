import { AsyncLocalStorage } from 'node:async_hooks';
import { getDb, type Db } from '../db';

const scoped = new AsyncLocalStorage<Db>();

/** The database the services work on: the app's one database, or the one a script or test runs them against. */
export function database(): Db {
  return scoped.getStore() ?? getDb();
}

/** Runs services against another database (the seed script and tests on a fresh one); every call inside uses it. */
export function withDatabase<T>(db: Db, fn: () => Promise<T>): Promise<T> {
  return scoped.run(db, fn);
}
