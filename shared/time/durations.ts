/**
 * Lengths of elapsed time. For calendar days in the chapter (due dates, days late, "today") use
 * chapter-time.ts instead: a chapter day is 23 or 25 hours long when the clocks change.
 */
export const SECOND_MS = 1000;
export const MINUTE_MS = 60 * SECOND_MS;
export const HOUR_MS = 60 * MINUTE_MS;
export const DAY_MS = 24 * HOUR_MS;
