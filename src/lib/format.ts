// The dependency-free half of shared/time: these formatters are on the pages every member opens first.
import { centsWords } from '@shared/stock/money';
import { countWords, quantityWords } from '@shared/stock/quantity-words';
import { dateInWords, dayInWords, momentInWords, monthDayInWords, shortDayInWords } from '@shared/time/words';
import { chapterTimeZone } from './chapter-zone';

/** Money, counts and days as every page shows them; a feature's own format module adds its trade words. */
/** Unit costs run to a hundredth of a cent (a rivet costs $0.0825). */
const unitCost = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD', minimumFractionDigits: 2, maximumFractionDigits: 4 });

/** Whole cents as money: 1240 → "$12.40". */
export const formatCents = centsWords;

/** A unit cost in dollars, keeping up to 4 decimals: 0.0825 → "$0.0825", 3 → "$3.00". */
export const formatUnitCost = (dollars: number): string => unitCost.format(dollars);

/** An assembly as every page names it: "Left aileron · Two-seat kit" (its name, then its build's). */
export const formatAssembly = (a: { name: string; buildName: string }): string => `${a.name} · ${a.buildName}`;

/** A whole quantity with thousands separators: 12000 → "12,000"; a fraction is rounded to a whole unit. */
export const formatCount = countWords;

/** A quantity with its unit, the unit in the plural for many: (250, "each") → "250 each", (4, "tube") → "4 tubes". */
export const formatQuantity = quantityWords;

/** A chapter day "2027-01-15", or the chapter day a timestamp fell on, as a date in words: "Jan 15, 2027". */
export const formatDay = (iso: string): string =>
  iso.length === 10 ? dateInWords(new Date(`${iso}T00:00:00Z`), 'UTC') : dateInWords(new Date(iso), chapterTimeZone());

/** A chapter day "2026-06-08" as month and day, for a chart's axis: "Jun 8". */
export const formatMonthDay = (day: string): string => monthDayInWords(new Date(`${day}T00:00:00Z`), 'UTC');

/** A moment as the chapter day it fell on, in short words: "Tue, Dec 1, 2026". */
export const formatDate = (iso: string | Date): string => shortDayInWords(new Date(iso), chapterTimeZone());

/** A moment on the chapter's clock: "Dec 1, 2026, 6:05 PM". */
export const formatDateTime = (iso: string | Date): string => momentInWords(new Date(iso), chapterTimeZone());

/** A due day in words on the chapter's calendar: "Tuesday, December 8" (with the year when not this year). */
export const formatDueDay = (iso: string | Date, now: Date = new Date()): string => dayInWords(new Date(iso), chapterTimeZone(), now);

const relative = new Intl.RelativeTimeFormat('en-US', { numeric: 'auto' });

/**
 * How long ago a moment was, in the largest whole unit: "just now", "10 min ago", "3 hours ago",
 * "yesterday", "4 days ago", and the day itself from a week on.
 */
export const formatTimeAgo = (iso: string, now: Date = new Date()): string => {
  const minutes = Math.max(0, (now.getTime() - new Date(iso).getTime()) / 60_000);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${Math.floor(minutes)} min ago`;
  const hours = minutes / 60;
  if (hours < 24) return relative.format(-Math.floor(hours), 'hour');
  const days = hours / 24;
  if (days < 7) return relative.format(-Math.floor(days), 'day');
  return formatDate(iso);
};
