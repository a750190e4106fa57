import { describe, expect, it } from 'vitest';
import {
  addChapterDays,
  addChapterMonths,
  chapterWeekStarts,
  startOfChapterWeek,
  chapterDay,
  chapterDaySpan,
  chapterHour,
  chapterMonth,
  chapterMonthStarts,
  chapterDaysBetween,
  dateInWords,
  daysLate,
  dayInWords,
  monthDayInWords,
  monthInWords,
  momentInWords,
  shortDayInWords,
  dueState,
  endOfChapterDay,
  isTimeZone,
  loanDueAt,
  startOfChapterDay,
  startOfDayNamed,
} from '@shared/time/chapter-time';

const CHICAGO = 'America/Chicago';
const AUCKLAND = 'Pacific/Auckland';

describe('the chapter calendar', () => {
  it('puts a moment on the chapter day, not the UTC day', () => {
    // 03:30 UTC on the 29th is still the evening of the 28th in Chicago (UTC−6 in November).
    const at = new Date('2026-11-29T03:30:00Z');
    expect(chapterDay(at, CHICAGO)).toBe('2026-11-28');
    expect(chapterDay(at, 'UTC')).toBe('2026-11-29');
    expect(chapterDay(at, AUCKLAND)).toBe('2026-11-29');
  });

  it('starts and ends a day at the chapter midnight', () => {
    const at = new Date('2026-11-29T03:30:00Z');
    expect(startOfChapterDay(at, CHICAGO).toISOString()).toBe('2026-11-28T06:00:00.000Z');
    expect(endOfChapterDay(at, CHICAGO).toISOString()).toBe('2026-11-29T05:59:59.999Z');
    expect(startOfDayNamed('2026-11-28', CHICAGO).toISOString()).toBe('2026-11-28T06:00:00.000Z');
    expect(startOfDayNamed('2026-12-01', AUCKLAND).toISOString()).toBe('2026-11-30T11:00:00.000Z'); // UTC+13: the day starts the evening before in UTC
  });

  // US daylight saving time starts on the second Sunday of March and ends on the first Sunday of
  // November (15 U.S.C. § 260a as amended by the Energy Policy Act of 2005): 8 March and 1 November 2026.
  it('keeps the wall clock across the spring change, a 23-hour day', () => {
    const saturdayNoon = new Date('2026-03-07T18:00:00Z'); // 12:00 CST
    const sundayNoon = addChapterDays(saturdayNoon, 1, CHICAGO);
    expect(sundayNoon.toISOString()).toBe('2026-03-08T17:00:00.000Z'); // 12:00 CDT
    expect(sundayNoon.getTime() - saturdayNoon.getTime()).toBe(23 * 3600_000);
  });

  it('counts calendar days, not 24-hour periods', () => {
    const lateEvening = new Date('2026-11-30T05:00:00Z'); // Sunday 23:00 in Chicago
    const earlyMorning = new Date('2026-11-30T07:00:00Z'); // Monday 01:00
    expect(chapterDaysBetween(lateEvening, earlyMorning, CHICAGO)).toBe(1);
    expect(chapterDaysBetween(lateEvening, earlyMorning, 'UTC')).toBe(0);
  });

  it('knows real zone names and refuses made-up ones', () => {
    expect(isTimeZone(CHICAGO)).toBe(true);
    expect(isTimeZone('UTC')).toBe(true);
    expect(isTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isTimeZone('')).toBe(false);
  });
});

describe('loans by the chapter day', () => {
  it('makes a week loan due by the end of the same weekday a week on', () => {
    const saturdayMorning = new Date('2026-11-28T15:00:00Z'); // 09:00 in Chicago
    const due = loanDueAt(saturdayMorning, 7, CHICAGO);
    expect(due.toISOString()).toBe('2026-12-06T05:59:59.999Z'); // Saturday 5 Dec, 23:59:59.999 CST
    expect(chapterDay(due, CHICAGO)).toBe('2026-12-05');
  });

  it('counts days late from the due day, at least one once past due', () => {
    const due = loanDueAt(new Date('2026-11-21T15:00:00Z'), 7, CHICAGO); // end of Saturday 28 Nov
    expect(daysLate(due, new Date('2026-11-29T06:30:00Z'), CHICAGO)).toBe(1); // 00:30 Sunday
    expect(daysLate(due, new Date('2026-12-01T16:00:00Z'), CHICAGO)).toBe(3); // Tuesday morning
    const afternoonDue = new Date('2026-12-01T21:00:00Z'); // 15:00 Tuesday
    expect(daysLate(afternoonDue, new Date('2026-12-02T00:00:00Z'), CHICAGO)).toBe(1); // 18:00 the same day
  });

  it('says the due state in chapter days', () => {
    const now = new Date('2026-12-01T16:00:00Z'); // Tuesday 10:00
    expect(dueState(new Date('2026-12-02T05:59:59.999Z'), now, CHICAGO)).toEqual({ words: 'due today', overdue: false, soon: true });
    expect(dueState(new Date('2026-12-03T05:59:59.999Z'), now, CHICAGO)).toEqual({ words: 'due tomorrow', overdue: false, soon: true });
    expect(dueState(new Date('2026-12-06T05:59:59.999Z'), now, CHICAGO).words).toBe('due in 4 days');
    expect(dueState(new Date('2026-11-29T05:59:59.999Z'), now, CHICAGO)).toEqual({ words: '3 days late', overdue: true, soon: false });
  });

  it('names a day in words, with the year only when it is not this year', () => {
    const now = new Date('2026-12-01T16:00:00Z');
    expect(dayInWords(new Date('2026-11-29T05:59:59.999Z'), CHICAGO, now)).toBe('Saturday, November 28');
    expect(dayInWords(new Date('2025-12-05T18:00:00Z'), CHICAGO, now)).toBe('Friday, December 5, 2025');
    expect(dateInWords(new Date('2026-11-29T05:59:59.999Z'), CHICAGO)).toBe('Nov 28, 2026');
    expect(dateInWords(new Date('2026-11-29T05:59:59.999Z'), AUCKLAND)).toBe('Nov 29, 2026');
    expect(monthDayInWords(new Date('2026-11-29T05:59:59.999Z'), CHICAGO)).toBe('Nov 28');
    expect(monthInWords(new Date('2026-12-01T02:00:00Z'), CHICAGO)).toBe('November 2026');
    expect(monthInWords(new Date('2026-12-01T02:00:00Z'), 'UTC', true)).toBe('Dec 26');
    expect(momentInWords(new Date('2026-12-02T03:05:00Z'), CHICAGO)).toBe('Dec 1, 2026, 9:05 PM');
    expect(shortDayInWords(new Date('2026-12-02T03:05:00Z'), CHICAGO)).toBe('Tue, Dec 1, 2026');
  });

  it('spans typed days from the chapter midnight that starts the first to the one that ends the last', () => {
    // Days named in Chicago (UTC−6), a span across the autumn clock change (25-hour day on November 1).
    const span = chapterDaySpan('2026-10-31', '2026-11-01', CHICAGO);
    expect(span.start.toISOString()).toBe('2026-10-31T05:00:00.000Z');
    expect(span.end.toISOString()).toBe('2026-11-02T06:00:00.000Z');
    expect(chapterDaySpan('2026-12-01', '2026-12-01', AUCKLAND)).toEqual({ start: new Date('2026-11-30T11:00:00.000Z'), end: new Date('2026-12-01T11:00:00.000Z') });
  });

  it('tells the hour on the chapter’s wall clock', () => {
    expect(chapterHour(new Date('2026-12-01T13:00:00Z'), CHICAGO)).toBe(7);
    expect(chapterHour(new Date('2026-12-01T13:00:00Z'), 'UTC')).toBe(13);
    expect(chapterHour(new Date('2026-06-01T12:00:00Z'), CHICAGO)).toBe(7); // daylight time, UTC−5
  });

  it('puts a moment in the chapter month, and lists the chapter months up to now', () => {
    const evening = new Date('2026-12-01T02:00:00Z'); // November 30, 20:00 in Chicago
    expect(chapterMonth(evening, CHICAGO)).toBe('2026-11');
    expect(chapterMonth(evening, 'UTC')).toBe('2026-12');
    expect(chapterMonthStarts(evening, 3, CHICAGO).map((d) => d.toISOString())).toEqual(['2026-09-01T05:00:00.000Z', '2026-10-01T05:00:00.000Z', '2026-11-01T05:00:00.000Z']);
  });
});

describe('chapter weeks', () => {
  it('start on Monday at the chapter’s midnight, on its side of the date line and of a clock change', () => {
    // Monday 03:00 UTC is still Sunday 21:00 in Chicago: the week that began Monday, November 23 (06:00Z, CST).
    const now = new Date('2026-11-30T03:00:00Z');
    expect(startOfChapterWeek(now, 'America/Chicago').toISOString()).toBe('2026-11-23T06:00:00.000Z');
    expect(startOfChapterWeek(now, 'UTC').toISOString()).toBe('2026-11-30T00:00:00.000Z');
    // Chicago's clocks went back on Sunday, November 1: the week of October 26 starts at 05:00Z (CDT), the next at 06:00Z (CST).
    expect(chapterWeekStarts(now, 5, 'America/Chicago').map((d) => d.toISOString())).toEqual([
      '2026-10-26T05:00:00.000Z',
      '2026-11-02T06:00:00.000Z',
      '2026-11-09T06:00:00.000Z',
      '2026-11-16T06:00:00.000Z',
      '2026-11-23T06:00:00.000Z',
    ]);
  });

  it('go back whole months on the chapter’s calendar, the last day when the month is shorter', () => {
    expect(addChapterMonths(new Date('2026-08-31T17:00:00Z'), -6, 'America/Chicago').toISOString()).toBe('2026-02-28T18:00:00.000Z');
  });
});
