import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import BetterSqlite3 from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import type { BaseSQLiteDatabase } from 'drizzle-orm/sqlite-core';
import * as accountTokens from './schema/account-tokens';
import * as badges from './schema/badges';
import * as builds from './schema/builds';
import * as cribJobs from './schema/crib-jobs';
import * as idempotency from './schema/idempotency';
import * as mail from './schema/mail';
import * as payments from './schema/payments';
import * as sessions from './schema/sessions';
import * as signoffRequests from './schema/signoff-requests';
import * as signoffs from './schema/signoffs';
import * as stations from './schema/stations';
import * as stock from './schema/stock';
import * as tools from './schema/tools';
import * as users from './schema/users';

export const schema = { ...users, ...accountTokens, ...sessions, ...mail, ...signoffs, ...tools, ...signoffRequests, ...cribJobs, ...stock, ...builds, ...idempotency, ...payments, ...badges, ...stations };
export type Database = BetterSQLite3Database<typeof schema> & { $client: BetterSqlite3.Database };
/** The database or a transaction on it: what repositories take. */
export type Executor = BaseSQLiteDatabase<'sync', BetterSqlite3.RunResult, typeof schema>;

export const MIGRATIONS = resolve(dirname(fileURLToPath(import.meta.url)), '../../drizzle');

/** Opens (creating if needed) the SQLite file, or ':memory:', with WAL and foreign keys on. */
export function openDatabase(path: string): Database {
  if (path !== ':memory:') mkdirSync(dirname(resolve(path)), { recursive: true });
  const sqlite = new BetterSqlite3(path);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('synchronous = NORMAL');
  sqlite.pragma('busy_timeout = 5000');
  sqlite.pragma('foreign_keys = ON');
  return drizzle(sqlite, { schema, casing: 'snake_case' });
}

/**
 * Applies the SQL in drizzle/. migrate() wraps every migration in one transaction, where the
 * `PRAGMA foreign_keys=OFF` of a table rebuild is ignored; so foreign keys go off around it and
 * the result is checked before they come back on.
 */
export function migrateDatabase(db: Database): void {
  const sqlite = db.$client;
  sqlite.pragma('foreign_keys = OFF');
  try {
    migrate(db, { migrationsFolder: MIGRATIONS });
    const broken = sqlite.pragma('foreign_key_check') as unknown[];
    if (broken.length > 0) {
      throw new Error(`Migration left ${broken.length} rows with broken foreign keys.`);
    }
  } finally {
    sqlite.pragma('foreign_keys = ON');
  }
}
