import { TZDate, tz } from '@date-fns/tz';
import { addDays, addMonths, addWeeks, differenceInCalendarDays, endOfDay, startOfDay, startOfMonth, startOfWeek } from 'date-fns';
import { daysLateWords } from './words';

export * from './words';

/**
 * The chapter's calendar: every "day" Gripline speaks of (a due date, days late, today's digest)
 * is a day on the chapter's wall clock, in its IANA time zone, whatever the server's or the
 * viewer's zone. Results are plain Dates (instants); only the arithmetic happens in the zone.
 */

const instant = (d: Date): Date => new Date(d.getTime());
const zoned = (zone: string) => ({ in: tz(zone) });

/** The first instants of the last `count` chapter months, oldest first, up to and including the month of `now`. */
export function chapterMonthStarts(now: Date, count: number, zone: string): Date[] {
  const current = startOfMonth(now, zoned(zone));
  return Array.from({ length: count }, (_, i) => instant(startOfMonth(addMonths(current, i - (count - 1), zoned(zone)), zoned(zone))));
}

/** Chapter weeks start on Monday (0 is Sunday), wherever the server or the viewer is. */
export const CHAPTER_WEEK_STARTS_ON = 1;

/** The first instant of the chapter week (from Monday's midnight on the chapter's clock) a moment falls in. */
export const startOfChapterWeek = (at: Date, zone: string): Date => instant(startOfWeek(at, { weekStartsOn: CHAPTER_WEEK_STARTS_ON, ...zoned(zone) }));

/** The first instants of the last `count` chapter weeks, oldest first, up to and including the week of `now`. */
export function chapterWeekStarts(now: Date, count: number, zone: string): Date[] {
  const current = startOfChapterWeek(now, zone);
  return Array.from({ length: count }, (_, i) => startOfChapterWeek(addWeeks(current, i - (count - 1), zoned(zone)), zone));
}

/** The same wall-clock time `months` chapter months earlier or later (Aug 31 less 6 months is Feb 28). */
export const addChapterMonths = (at: Date, months: number, zone: string): Date => instant(addMonths(at, months, zoned(zone)));

/** The first instant of the chapter day a moment falls on. */
export const startOfChapterDay = (at: Date, zone: string): Date => instant(startOfDay(at, zoned(zone)));

/** The last instant of the chapter day a moment falls on. */
export const endOfChapterDay = (at: Date, zone: string): Date => instant(endOfDay(at, zoned(zone)));

/** The same wall-clock time `days` calendar days later (or earlier) in the chapter. */
export const addChapterDays = (at: Date, days: number, zone: string): Date => instant(addDays(at, days, zoned(zone)));

/** Calendar days from one moment's chapter day to another's: Monday 23:00 → Tuesday 01:00 is 1. */
export const chapterDaysBetween = (from: Date, to: Date, zone: string): number => differenceInCalendarDays(to, from, zoned(zone));

/** The chapter's midnight starting a calendar day "2026-11-29" (built on the chapter's wall clock, so any zone's). */
export function startOfDayNamed(day: string, zone: string): Date {
  const [y, m, d] = day.split('-').map(Number);
  return instant(new TZDate(y!, m! - 1, d!, zone));
}

/**
 * The moments from the chapter's midnight starting `from` to the one ending `to` ("2026-11-01" to
 * "2026-11-30", both whole days), for a range a person typed as days: start included, end excluded.
 */
export function chapterDaySpan(from: string, to: string, zone: string): { start: Date; end: Date } {
  return { start: startOfDayNamed(from, zone), end: instant(startOfDay(addDays(startOfDayNamed(to, zone), 1, zoned(zone)), zoned(zone))) };
}

/**
 * When a loan is due back: by the end of the chapter day `loanDays` days after the day it went
 * out. A week's loan taken on a Saturday morning is due by the end of the next Saturday.
 * The one due-date rule for the server, the offline copy and every screen.
 */
export const loanDueAt = (takenAt: Date, loanDays: number, zone: string): Date => endOfChapterDay(addChapterDays(takenAt, loanDays, zone), zone);

/**
 * How late a loan is: chapter calendar days from its due day to today, at least 1 once it is
 * past due. The one rule for the Overdue page, the reminders, the badges and refusals.
 */
export const daysLate = (dueAt: Date, now: Date, zone: string): number => Math.max(1, chapterDaysBetween(dueAt, now, zone));

export interface DueState {
  /** "due today", "due tomorrow", "due in 3 days", "2 days late". */
  words: string;
  overdue: boolean;
  /** Due within two chapter days. */
  soon: boolean;
}

/** A loan's due state in words, by chapter days; past the due moment it is late by the `daysLate` rule. */
export function dueState(dueAt: Date, now: Date, zone: string): DueState {
  if (dueAt.getTime() < now.getTime()) return { words: daysLateWords(daysLate(dueAt, now, zone)), overdue: true, soon: false };
  const days = chapterDaysBetween(now, dueAt, zone);
  if (days === 0) return { words: 'due today', overdue: false, soon: true };
  if (days === 1) return { words: 'due tomorrow', overdue: false, soon: true };
  return { words: `due in ${days} days`, overdue: false, soon: days <= 2 };
}
