import { parseBackupName, type BackupName } from './backup-names';

export interface RetentionRule {
  days: number;
  weeks: number;
}

/** What the nightly job keeps: the newest copy of each of the last 7 days and of each of the last 4 ISO weeks. */
export const NIGHTLY_RETENTION: RetentionRule = { days: 7, weeks: 4 };

/**
 * The backup files to delete, decided from the dates in their names alone. "The last 7 days" are the 7
 * latest days that have a copy (likewise weeks), so a server that was off for a month does not wake up
 * and delete its whole history. Files not named like a backup are never listed.
 */
export function backupsToDelete(fileNames: readonly string[], rule: RetentionRule = NIGHTLY_RETENTION): string[] {
  const copies = fileNames.map(parseBackupName).filter((c): c is BackupName => c !== undefined);
  copies.sort((a, b) => (a.stamp < b.stamp ? 1 : a.stamp > b.stamp ? -1 : 0));
  const keep = new Set([...newestPer(copies, (c) => c.day, rule.days), ...newestPer(copies, (c) => c.week, rule.weeks)]);
  return copies.filter((c) => !keep.has(c.name)).map((c) => c.name);
}

/** From copies sorted newest first: the newest copy in each of the `count` latest periods. */
function newestPer(newestFirst: readonly BackupName[], period: (c: BackupName) => string, count: number): string[] {
  const seen = new Set<string>();
  const kept: string[] = [];
  for (const copy of newestFirst) {
    const key = period(copy);
    if (seen.has(key)) continue;
    if (seen.size === count) break;
    seen.add(key);
    kept.push(copy.name);
  }
  return kept;
}
