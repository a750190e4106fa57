import type { JobRun, OverdueList, OverdueLoan, ReminderSent } from '@shared/schemas/overdue';
import { chapterDay, dayInWords, daysLate } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { overdueReminderMail, type MailCalendar, type OverdueMailLine } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { lastJobRun } from '../../jobs/job-runs.repo';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { claimReminder, findLoanForReminder, listOverdueLoans, loansRemindedOn, type OverdueLoanRow } from './overdue.repo';

export const OVERDUE_JOB = 'overdue-reminders';

/** The chapter's calendar now: its zone and the moment, for counting days and writing them. */
export const chapterCalendar = (ctx: ServiceContext): MailCalendar => ({ zone: readChapterTimeZone(ctx.db), now: ctx.now() });

/** Chapter days past due; a loan less than a day late is 1 day late, never 0. */
export function toMailLine(row: OverdueLoanRow, calendar: MailCalendar): OverdueMailLine {
  return { tool: row.tool, holder: row.holder, dueAt: row.dueAt, daysLate: daysLate(row.dueAt, calendar.now, calendar.zone) };
}

/** Most days late first; ties keep the order of the due date. */
export function overdueLoans(ctx: ServiceContext, calendar: MailCalendar = chapterCalendar(ctx)): OverdueLoanRow[] {
  const late = (row: OverdueLoanRow) => daysLate(row.dueAt, calendar.now, calendar.zone);
  return listOverdueLoans(ctx.db, calendar.now).sort((a, b) => late(b) - late(a));
}

export function listOverdue(ctx: ServiceContext): OverdueList {
  const calendar = chapterCalendar(ctx);
  const remindedToday = loansRemindedOn(ctx.db, chapterDay(calendar.now, calendar.zone));
  const data: OverdueLoan[] = overdueLoans(ctx, calendar).map((row) => ({
    loanId: row.loanId,
    tool: row.tool,
    holder: row.holder,
    dueAt: row.dueAt.toISOString(),
    daysLate: toMailLine(row, calendar).daysLate,
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
  const calendar = chapterCalendar(ctx);
  const { now, zone } = calendar;
  const row = findLoanForReminder(ctx.db, loanId);
  if (!row) throw new HttpError(404, 'LOAN_NOT_FOUND', `No loan has the id ${loanId}.`);
  if (row.returnedAt) throw new HttpError(409, 'LOAN_RETURNED', `${row.tool.code} has already come back, so there is nothing to remind ${row.holder.name} about.`);
  if (row.dueAt.getTime() >= now.getTime()) {
    throw new HttpError(409, 'LOAN_NOT_OVERDUE', `${row.tool.code} is not due back until ${dayInWords(row.dueAt, zone, now)}; a reminder can go once it is late.`);
  }
  const day = chapterDay(now, zone);
  ctx.db.transaction((db) => {
    if (!claimReminder(db, { loanId, day, sentAt: now, sentById: lead.id })) {
      throw new HttpError(409, 'REMINDER_ALREADY_SENT', `${row.holder.name} has already been reminded about ${row.tool.code} today; try again tomorrow.`);
    }
    queueMail(db, overdueReminderMail(toMailLine(row, calendar), ctx.publicUrl, calendar), now);
  });
  return { loanId, sentTo: row.holder.email, sentAt: now.toISOString(), day };
}
