import { daysLate, type JobRun, type OverdueList, type OverdueLoan, type ReminderSent } from '@shared/schemas/overdue';
import { dayInWords } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { overdueReminderMail, type OverdueMailLine } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { lastJobRun } from '../../jobs/job-runs.repo';
import { claimReminder, findLoanForReminder, listOverdueLoans, loansRemindedOn, type OverdueLoanRow } from './overdue.repo';

export const OVERDUE_JOB = 'overdue-reminders';

/** The chapter's calendar day in server local time (the daily job runs at 07:00 local), YYYY-MM-DD. */
export function calendarDay(at: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${at.getFullYear()}-${pad(at.getMonth() + 1)}-${pad(at.getDate())}`;
}

/** Whole days past due, counted down; a loan less than a day late is 1 day late, never 0. */
export function toMailLine(row: OverdueLoanRow, now: Date): OverdueMailLine {
  return { tool: row.tool, holder: row.holder, dueAt: row.dueAt, daysLate: daysLate(row.dueAt, now) };
}

/** Most days late first; ties keep the order of the due date. */
export function overdueLoans(ctx: ServiceContext): OverdueLoanRow[] {
  const now = ctx.now();
  return listOverdueLoans(ctx.db, now).sort((a, b) => daysLate(b.dueAt, now) - daysLate(a.dueAt, now));
}

export function listOverdue(ctx: ServiceContext): OverdueList {
  const now = ctx.now();
  const remindedToday = loansRemindedOn(ctx.db, calendarDay(now));
  const data: OverdueLoan[] = overdueLoans(ctx).map((row) => ({
    loanId: row.loanId,
    tool: row.tool,
    holder: row.holder,
    dueAt: row.dueAt.toISOString(),
    daysLate: daysLate(row.dueAt, now),
    lastReminderAt: row.lastReminderAt?.toISOString() ?? null,
    remindedToday: remindedToday.has(row.loanId),
  }));
  return { data, lastRun: lastOverdueRun(ctx) };
}

function lastOverdueRun(ctx: ServiceContext): JobRun | null {
  const run = lastJobRun(ctx.db, OVERDUE_JOB);
  if (!run) return null;
  return { startedAt: run.startedAt.toISOString(), finishedAt: run.finishedAt?.toISOString() ?? null, summary: run.summary, error: run.error };
}

/**
 * Sends one holder a reminder now, on the lead's word. The unique (loan, day) index allows one a
 * day whoever sends it (the lead or the daily job); the day's slot and the mail in the outbox are
 * written together.
 */
export function sendReminderNow(ctx: ServiceContext, lead: UserRow, loanId: number): ReminderSent {
  const now = ctx.now();
  const row = findLoanForReminder(ctx.db, loanId);
  if (!row) throw new HttpError(404, 'LOAN_NOT_FOUND', `No loan has the id ${loanId}.`);
  if (row.returnedAt) throw new HttpError(409, 'LOAN_RETURNED', `${row.tool.code} has already come back, so there is nothing to remind ${row.holder.name} about.`);
  if (row.dueAt.getTime() >= now.getTime()) {
    throw new HttpError(409, 'LOAN_NOT_OVERDUE', `${row.tool.code} is not due back until ${dayInWords(row.dueAt, readChapterTimeZone(ctx.db), now)}; a reminder can go once it is late.`);
  }
  const day = calendarDay(now);
  ctx.db.transaction((db) => {
    if (!claimReminder(db, { loanId, day, sentAt: now, sentById: lead.id })) {
      throw new HttpError(409, 'REMINDER_ALREADY_SENT', `${row.holder.name} has already been reminded about ${row.tool.code} today; try again tomorrow.`);
    }
    queueMail(db, overdueReminderMail(toMailLine(row, now), ctx.publicUrl), now);
  });
  return { loanId, sentTo: row.holder.email, sentAt: now.toISOString(), day };
}
