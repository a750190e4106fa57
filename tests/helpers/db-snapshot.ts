import type { Database } from '../../server/db/client';

/**
 * Every row of every table but the sessions (a request renews its own session), as one value:
 * two snapshots are equal exactly when nothing the product keeps was written between them.
 */
export function dataSnapshot(db: Database): Record<string, unknown[]> {
  const tables = db.$client
    .prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name <> 'sessions' order by name")
    .all() as { name: string }[];
  return Object.fromEntries(tables.map(({ name }) => [name, db.$client.prepare(`select * from "${name}" order by rowid`).all()]));
}
