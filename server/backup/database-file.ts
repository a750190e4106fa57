import { rmSync } from 'node:fs';
import BetterSqlite3 from 'better-sqlite3';
import { readMigrationFiles } from 'drizzle-orm/migrator';
import { MIGRATIONS } from '../db/client';

/** A backup or restore that cannot go ahead; its message says why and what to do. */
export class BackupError extends Error {}

/** drizzle's record of the migrations applied to a database, oldest first. */
const MIGRATIONS_TABLE = '__drizzle_migrations';

/** The hashes of the migrations applied to a database, oldest first; undefined when it has no migrations table. */
export function appliedMigrations(sqlite: BetterSqlite3.Database): string[] | undefined {
  const table = sqlite.prepare('select 1 from sqlite_master where type = ? and name = ?').get('table', MIGRATIONS_TABLE);
  if (!table) return undefined;
  return (sqlite.prepare(`select hash from ${MIGRATIONS_TABLE} order by created_at, id`).all() as { hash: string }[]).map((r) => r.hash);
}

/** The hashes of the migrations this version of Gripline knows (drizzle/), oldest first. */
export function knownMigrations(): string[] {
  return readMigrationFiles({ migrationsFolder: MIGRATIONS }).map((m) => m.hash);
}

/**
 * Opens a database file and checks it page by page (`PRAGMA integrity_check`), returning its applied
 * migrations. A file that is not a SQLite database, or is damaged, or is not Gripline's, throws BackupError.
 * The file is opened for writing: a copy in WAL mode needs its -shm to be read.
 */
export function checkDatabaseFile(path: string): string[] {
  let sqlite: BetterSqlite3.Database | undefined;
  try {
    sqlite = new BetterSqlite3(path, { fileMustExist: true });
    const problems = (sqlite.pragma('integrity_check') as { integrity_check: string }[]).map((r) => r.integrity_check);
    if (problems.length !== 1 || problems[0] !== 'ok') {
      throw new BackupError(`${path} is damaged: integrity_check reports ${problems.slice(0, 3).join('; ')}.`);
    }
    const migrations = appliedMigrations(sqlite);
    if (!migrations || migrations.length === 0) throw new BackupError(`${path} is not a Gripline database: it has no migrations table.`);
    return migrations;
  } catch (err) {
    if (err instanceof BackupError) throw err;
    throw new BackupError(`${path} cannot be read as a database: ${(err as Error).message}.`);
  } finally {
    sqlite?.close();
  }
}

/** Removes a database file with the journal files SQLite keeps beside it. */
export function removeWithSidecars(path: string): void {
  for (const suffix of ['', '-wal', '-shm', '-journal']) rmSync(`${path}${suffix}`, { force: true });
}
