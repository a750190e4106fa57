import type { Database } from './client';

/**
 * Statements prepared once per database. Drizzle's query builder rebuilds and re-prepares its SQL
 * on every call, which costs more than running the query on the paths every request or scan takes.
 * Prepared on the connection itself, the statements also run inside that connection's transactions.
 */
export function preparedPerDatabase<T>(prepare: (db: Database) => T): (db: Database) => T {
  const cache = new WeakMap<Database, T>();
  return (db) => {
    let statements = cache.get(db);
    if (statements === undefined) {
      statements = prepare(db);
      cache.set(db, statements);
    }
    return statements;
  };
}
