import { readdirSync, rmSync } from 'node:fs';
import { basename, join } from 'node:path';
import { Cron } from 'croner';
import type BetterSqlite3 from 'better-sqlite3';
import type { Logger } from '../lib/logger';
import { backupsToDelete } from './retention';
import { takeBackup } from './take-backup';

export const NIGHTLY_BACKUP_JOB = 'nightly-backup';
/** Daily at 03:00 server local time, when nobody is at the bench (before the 03:30 housekeeping). */
export const NIGHTLY_BACKUP_SCHEDULE = '0 3 * * *';

export interface NightlyBackupResult {
  file: string;
  deleted: string[];
}

/** Takes a backup, then deletes the copies the retention rule no longer keeps (only once the new one is checked). */
export async function runNightlyBackup(source: BetterSqlite3.Database, backupDir: string, now: Date): Promise<NightlyBackupResult> {
  const { file } = await takeBackup(source, backupDir, now);
  const deleted = backupsToDelete(readdirSync(backupDir));
  for (const name of deleted) rmSync(join(backupDir, name), { force: true });
  return { file: basename(file), deleted };
}

/** Starts the nightly backup on the server's own connection. A failing run is logged and the schedule goes on. */
export function startBackupScheduler(source: BetterSqlite3.Database, backupDir: string, logger: Logger, now: () => Date = () => new Date()): { stop(): void } {
  const job = new Cron(NIGHTLY_BACKUP_SCHEDULE, { name: NIGHTLY_BACKUP_JOB, protect: true, unref: true }, async () => {
    try {
      const result = await runNightlyBackup(source, backupDir, now());
      logger.info({ job: NIGHTLY_BACKUP_JOB, result }, 'scheduled job finished');
    } catch (err) {
      logger.error({ job: NIGHTLY_BACKUP_JOB, err }, 'scheduled job failed');
    }
  });
  return { stop: () => job.stop() };
}
