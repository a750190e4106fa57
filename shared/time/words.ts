/**
 * The dependency-free half of the chapter calendar (chapter-time.ts re-exports all of it): zone
 * names, the chapter day, month and hour a moment falls on, and days in words. Built on the
 * runtime's own Intl, so the pages every member opens first (sign-in, home) carry no date library.
 */

/** The zone the server runs in, the chapter's default until a lead chooses one. */
export const serverTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** Whether the runtime knows this IANA zone name ("America/Denver" yes, "Mars/Base" no). */
export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: zone });
    return zone.length > 0;
  } catch {
    return false;
  }
}

const cache = new Map<string, Intl.DateTimeFormat>();
function formatter(zone: string, name: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${name} ${zone}`;
  let f = cache.get(key);
  if (!f) cache.set(key, (f = new Intl.DateTimeFormat('en-US', { ...options, timeZone: zone })));
  return f;
}

/** ICU writes a narrow no-break space before AM/PM; mail and tests read a plain one. */
const plain = (text: string) => text.replace(/[\u202f\u00a0]/g, ' ');

function wallClock(at: Date, zone: string): { year: string; month: string; day: string; hour: number } {
  const parts = formatter(zone, 'parts', { year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', hourCycle: 'h23' }).formatToParts(at);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return { year: part('year'), month: part('month'), day: part('day'), hour: Number(part('hour')) % 24 };
}

/** The chapter day a moment falls on, as "2026-11-29". */
export function chapterDay(at: Date, zone: string): string {
  const { year, month, day } = wallClock(at, zone);
  return `${year}-${month}-${day}`;
}

/** The chapter month a moment falls in, as "2026-11". */
export const chapterMonth = (at: Date, zone: string): string => chapterDay(at, zone).slice(0, 7);

/** The hour (0–23) on the chapter's wall clock: the daily jobs run at 07:00 chapter time. */
export const chapterHour = (at: Date, zone: string): number => wallClock(at, zone).hour;

/** "1 day", "3 days". */
export const dayCount = (n: number): string => `${n} ${Math.abs(n) === 1 ? 'day' : 'days'}`;

/** "1 day late", "5 days late". */
export const daysLateWords = (days: number): string => `${dayCount(days)} late`;

/**
 * A chapter day in words: "Sunday, November 29", with the year when it is not this year
 * ("Friday, December 4, 2025").
 */
export function dayInWords(at: Date, zone: string, now: Date = new Date()): string {
  const sameYear = chapterDay(at, zone).slice(0, 4) === chapterDay(now, zone).slice(0, 4);
  return sameYear
    ? formatter(zone, 'day', { weekday: 'long', month: 'long', day: 'numeric' }).format(at)
    : formatter(zone, 'day-year', { weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' }).format(at);
}

/** A chapter day as a date in words, for planned days and weeks: "Nov 29, 2026". */
export const dateInWords = (at: Date, zone: string): string => formatter(zone, 'date', { month: 'short', day: 'numeric', year: 'numeric' }).format(at);

/** A chapter day as a chart axis names it: "Nov 29". */
export const monthDayInWords = (at: Date, zone: string): string => formatter(zone, 'month-day', { month: 'short', day: 'numeric' }).format(at);

/** A chapter month in words: "November 2026"; `short` for chart axes: "Nov 26". */
export const monthInWords = (at: Date, zone: string, short = false): string =>
  short
    ? formatter(zone, 'month-short', { month: 'short', year: '2-digit' }).format(at)
    : formatter(zone, 'month', { month: 'long', year: 'numeric' }).format(at);

/** A chapter day in short words for tables: "Sun, Nov 29, 2026". */
export const shortDayInWords = (at: Date, zone: string): string =>
  formatter(zone, 'short-day', { weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' }).format(at);

/** A moment on the chapter's clock: "Nov 29, 2026, 6:05 PM". */
export const momentInWords = (at: Date, zone: string): string =>
  plain(formatter(zone, 'moment', { month: 'short', day: 'numeric', year: 'numeric', hour: 'numeric', minute: '2-digit' }).format(at));
