import { daysLate, daysLateWords } from '@shared/schemas/overdue';

const DAY_MS = 24 * 60 * 60 * 1000;

export interface DueState {
  words: string;
  overdue: boolean;
  soon: boolean;
}

/**
 * "due today", "due in 3 days": calendar days until the due moment; once past due, "2 days late"
 * counted by the shared rule the Overdue page and the reminders use.
 */
export function dueState(dueAt: string | Date, now: Date = new Date()): DueState {
  const due = new Date(dueAt);
  const startOfDay = (d: Date) => Date.UTC(d.getFullYear(), d.getMonth(), d.getDate());
  const days = Math.round((startOfDay(due) - startOfDay(now)) / DAY_MS);
  if (due.getTime() < now.getTime()) return { words: daysLateWords(daysLate(due, now)), overdue: true, soon: false };
  if (days === 0) return { words: 'due today', overdue: false, soon: true };
  if (days === 1) return { words: 'due tomorrow', overdue: false, soon: true };
  return { words: `due in ${days} days`, overdue: false, soon: days <= 2 };
}

export const shortDate = new Intl.DateTimeFormat(undefined, { weekday: 'short', month: 'short', day: 'numeric' });
export const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
export const money = new Intl.NumberFormat(undefined, { style: 'currency', currency: 'USD' });
