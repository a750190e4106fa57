import { copyFileSync, existsSync, renameSync, rmSync } from 'node:fs';
import { basename, dirname, extname, join, resolve } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import { localStamp } from './backup-names';
import { BackupError, checkDatabaseFile, knownMigrations, removeWithSidecars } from './database-file';

export interface Restored {
  /** The database as it was before, kept beside it; undefined when there was none. */
  keptAs: string | undefined;
}

/**
 * Puts a backup back in place of the database. The backup is copied beside the database and checked
 * there first (integrity, and migrations this version knows); the current database must not be open
 * anywhere (see `closeOrRefuse`); it is kept as `<name>.before-restore-<date>.db` with its recent
 * writes folded in, and no -wal or -shm file is left to be replayed onto the restored copy.
 */
export function restoreDatabase(options: { file: string; databasePath: string; now: Date }): Restored {
  const file = resolve(options.file);
  const databasePath = resolve(options.databasePath);
  if (!existsSync(file)) throw new BackupError(`${file} does not exist.`);
  if (file === databasePath) throw new BackupError(`${file} is the database itself; name a backup.`);

  const incoming = `${databasePath}.restoring`;
  removeWithSidecars(incoming);
  try {
    copyFileSync(file, incoming);
    checkMigrationsKnown(file, checkDatabaseFile(incoming));
    const keptAs = existsSync(databasePath) ? setAside(databasePath, options.now) : undefined;
    renameSync(incoming, databasePath);
    return { keptAs };
  } finally {
    removeWithSidecars(incoming);
  }
}

/** A backup may be older than this version (start-up migrates it), never newer nor from another history. */
function checkMigrationsKnown(file: string, applied: string[]): void {
  const known = knownMigrations();
  if (applied.length > known.length) {
    throw new BackupError(`${file} was taken by a newer Gripline (${applied.length} migrations, this one knows ${known.length}): update Gripline first.`);
  }
  if (applied.some((hash, i) => hash !== known[i])) throw new BackupError(`${file} has migrations this Gripline does not know; it was not restored.`);
}

/**
 * Proves nobody has the database open, then moves it aside. SQLite lets a connection leave WAL mode
 * only when it is the only one: every open connection (a running Gripline, a backup under way, a sqlite
 * shell) holds a shared lock on the file, so `journal_mode = DELETE` fails with SQLITE_BUSY. When it
 * succeeds the WAL has been checkpointed into the file and deleted, so the copy kept aside is complete
 * on its own. No pid file is involved, so nothing goes stale after a crash.
 */
function setAside(databasePath: string, now: Date): string {
  closeOrRefuse(databasePath);
  const keptAs = join(dirname(databasePath), `${basename(databasePath, extname(databasePath))}.before-restore-${localStamp(now)}.db`);
  renameSync(databasePath, keptAs);
  for (const suffix of ['-wal', '-shm', '-journal']) rmSync(`${databasePath}${suffix}`, { force: true });
  return keptAs;
}

function closeOrRefuse(databasePath: string): void {
  let sqlite: BetterSqlite3.Database | undefined;
  try {
    sqlite = new BetterSqlite3(databasePath, { fileMustExist: true, timeout: 1000 });
    const mode = sqlite.pragma('journal_mode = DELETE', { simple: true });
    if (mode !== 'delete') throw new BackupError(runningMessage(databasePath));
  } catch (err) {
    if (err instanceof BackupError) throw err;
    const code = (err as { code?: string }).code ?? '';
    if (code.startsWith('SQLITE_BUSY') || code.startsWith('SQLITE_LOCKED')) throw new BackupError(runningMessage(databasePath));
    throw new BackupError(`${databasePath} cannot be opened to set it aside (${(err as Error).message}); move it away by hand, then restore again.`);
  } finally {
    sqlite?.close();
  }
}

function runningMessage(databasePath: string): string {
  return `${databasePath} is open in another process: stop Gripline (and any backup or sqlite shell using it), then restore again.`;
}
