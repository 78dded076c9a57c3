import { AsyncLocalStorage } from 'node:async_hooks';
import { getDb, type Db } from '../db';

const scoped = new AsyncLocalStorage<Db>();

/** The database the services work on: the app's one database, or the one a script or test runs them against. */
export function database(): Db {
  return scoped.getStore() ?? getDb();
}

/**
 * A statement prepared once per database (the app's, or a test's own) and reused on every call: for the reads
 * on every request, whose query text would otherwise be built again each time.
 */
export function preparedPerDatabase<T>(prepare: (db: Db) => T): (db: Db) => T {
  const prepared = new WeakMap<Db, T>();
  return (db) => {
    let q = prepared.get(db);
    if (q === undefined) prepared.set(db, (q = prepare(db)));
    return q;
  };
}

/** Runs services against another database (the seed script and tests on a fresh one); every call inside uses it. */
export function withDatabase<T>(db: Db, fn: () => Promise<T>): Promise<T> {
  return scoped.run(db, fn);
}
