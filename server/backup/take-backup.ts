import { mkdirSync, renameSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import { backupFileName } from './backup-names';
import { appliedMigrations, BackupError, checkDatabaseFile, removeWithSidecars } from './database-file';

/** Where backups go: BACKUP_DIR, or `backups/` beside the database. */
export function backupDirFor(env: { DATABASE_PATH: string; BACKUP_DIR?: string }): string {
  return resolve(env.BACKUP_DIR ?? join(dirname(env.DATABASE_PATH), 'backups'));
}

export interface TakenBackup {
  file: string;
  pages: number;
}

/**
 * Copies a live database through SQLite's backup API into `backupDir`, named by the local date and time.
 * The copy is one read transaction, so it is a snapshot that holds every write committed before it began,
 * whatever other connections write meanwhile (WAL lets them go on). It lands under a temporary name,
 * is switched out of WAL mode (one self-contained file), checked with integrity_check and against the
 * source's migrations, and only then takes its final name: a failed copy never looks like a backup.
 */
export async function takeBackup(source: BetterSqlite3.Database, backupDir: string, now: Date): Promise<TakenBackup> {
  mkdirSync(backupDir, { recursive: true });
  const file = join(backupDir, backupFileName(now));
  const partial = `${file}.${process.pid}.partial`;
  removeWithSidecars(partial);
  try {
    // better-sqlite3 copies 100 pages per step and yields between steps; another connection's write
    // between steps restarts the copy, so a busy database could keep it from finishing. After the first
    // step, the rest goes in one step (one read transaction).
    const progress = await source.backup(partial, { progress: () => 0x7fffffff });
    const expected = appliedMigrations(source) ?? [];
    useRollbackJournal(partial);
    const copied = checkDatabaseFile(partial);
    if (copied.join() !== expected.join()) {
      throw new BackupError(`The copy's migrations (${copied.length}) differ from the database's (${expected.length}); it was not kept.`);
    }
    renameSync(partial, file);
    return { file, pages: progress.totalPages };
  } finally {
    removeWithSidecars(partial);
  }
}

/** The copy carries the source's WAL mode in its header; a backup is easier to keep as one file. */
function useRollbackJournal(path: string): void {
  const copy = new BetterSqlite3(path, { fileMustExist: true });
  try {
    copy.pragma('journal_mode = DELETE');
  } finally {
    copy.close();
  }
}
