import { addChapterDays, chapterDay, monthDayInWords } from '@shared/time/chapter-time';
import { chapterTimeZone } from '@/lib/chapter-zone';
import { formatCount } from '@/lib/format';

export { formatCents, formatCount, formatDay, formatQuantity, formatUnitCost } from '@/lib/format';

const oneDecimal = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

/** 47.25 → "47.3": weekly averages and σ. */
export const formatTenth = (n: number): string => oneDecimal.format(n);
/** A projected level, to a tenth where demand is fractional, with a real minus sign: −20, 1.9. */
export const formatLevel = (n: number): string => (n < 0 ? `−${oneDecimal.format(-n)}` : oneDecimal.format(n));

/** The server's reasons come without a full stop; a sentence on screen ends with one. */
export const asSentence = (text: string): string => (/[.!?]$/.test(text) ? text : `${text}.`);

/** A week's Monday for a chart axis: "Jan 11". */
export const formatWeek = (iso: string): string => monthDayInWords(new Date(`${iso}T00:00:00Z`), 'UTC');

/** The chapter day `days` after `from`'s, as YYYY-MM-DD for a date field. */
export function dayAfter(from: Date, days: number): string {
  const zone = chapterTimeZone();
  return chapterDay(addChapterDays(from, Math.ceil(days), zone), zone);
}

/** Whole packs an order makes: 600 in packs of 250 → 3 (orders are rounded up to packs). */
export const packsFor = (quantity: number, packSize: number): number => Math.ceil(quantity / Math.max(1, packSize));

/** "3 packs of 250", or '' where the bin is bought by the unit. */
export function packWords(quantity: number, packSize: number): string {
  if (packSize <= 1) return '';
  const packs = packsFor(quantity, packSize);
  return `${formatCount(packs)} ${packs === 1 ? 'pack' : 'packs'} of ${formatCount(packSize)}`;
}

/** 0.95 → "95 %", 0.975 → "97.5 %". */
export const formatPercent = (fraction: number): string => `${oneDecimal.format(fraction * 100)} %`;

/** A lead time in words: 21 days → "3 weeks", 10 days → "10 days". */
export function leadTimeWords(days: number): string {
  if (days > 0 && days % 7 === 0) return days === 7 ? '1 week' : `${days / 7} weeks`;
  return days === 1 ? '1 day' : `${formatCount(days)} days`;
}
