import { dayInWords, daysLate, daysLateWords, momentInWords } from '@shared/time/chapter-time';

/**
 * Who has a tool, in words, for refusals and the tool page: "Marco has it until Friday, December 4",
 * "Marco has it; it was due Sunday, November 29 (3 days late)"; "You have it …" for the holder.
 */
export function loanWords(holder: { name: string; you: boolean }, dueAt: Date, now: Date, zone: string): string {
  const has = holder.you ? 'You have it' : `${holder.name} has it`;
  if (dueAt.getTime() >= now.getTime()) return `${has} until ${dayInWords(dueAt, zone, now)}.`;
  return `${has}; it was due ${dayInWords(dueAt, zone, now)} (${daysLateWords(daysLate(dueAt, now, zone))}).`;
}

/** A tool set aside for someone: "It is set aside for Ines until Dec 3, 2026, 6:05 PM." */
export function heldWords(name: string, until: Date | null, zone: string): string {
  return until ? `It is set aside for ${name} until ${momentInWords(until, zone)}.` : `It is set aside for ${name} until they collect it.`;
}
