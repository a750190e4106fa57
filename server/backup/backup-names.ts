import { DAY_MS } from '@shared/time/durations';
/** Backups are named by the server's local date and time to the minute: gripline-2026-12-03T0230.db. */
const PREFIX = 'gripline-';
const NAME = /^gripline-(\d{4})-(\d{2})-(\d{2})T(\d{2})(\d{2})\.db$/;

const pad = (n: number) => String(n).padStart(2, '0');

/** The stamp in backup and before-restore names, in server local time: 2026-12-03T0230. */
export function localStamp(at: Date): string {
  return `${at.getFullYear()}-${pad(at.getMonth() + 1)}-${pad(at.getDate())}T${pad(at.getHours())}${pad(at.getMinutes())}`;
}

export function backupFileName(at: Date): string {
  return `${PREFIX}${localStamp(at)}.db`;
}

export interface BackupName {
  name: string;
  /** Sorts like the time the copy was taken. */
  stamp: string;
  /** Local calendar day, YYYY-MM-DD. */
  day: string;
  /** ISO 8601 week of that day, YYYY-Www (weeks start on Monday; week 1 holds the year's first Thursday). */
  week: string;
}

/** The dates in a backup's name; undefined for any other file (which retention never touches). */
export function parseBackupName(name: string): BackupName | undefined {
  const m = NAME.exec(name);
  if (!m) return undefined;
  const [year, month, date] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const calendar = new Date(Date.UTC(year, month - 1, date));
  if (calendar.getUTCMonth() !== month - 1 || Number(m[4]) > 23 || Number(m[5]) > 59) return undefined;
  return { name, stamp: `${m[1]}-${m[2]}-${m[3]}T${m[4]}${m[5]}`, day: `${m[1]}-${m[2]}-${m[3]}`, week: isoWeek(calendar) };
}

/** ISO week of a calendar day given as UTC midnight: the week belongs to the year of its Thursday. */
function isoWeek(day: Date): string {
  const weekday = day.getUTCDay() || 7;
  const thursday = new Date(day.getTime() + (4 - weekday) * DAY_MS);
  const year = thursday.getUTCFullYear();
  const week = 1 + Math.floor((thursday.getTime() - Date.UTC(year, 0, 1)) / (7 * DAY_MS));
  return `${year}-W${pad(week)}`;
}
