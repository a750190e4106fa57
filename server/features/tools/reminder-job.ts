import type { ServiceContext } from '../../context';
import { overdueDigestMail, overdueReminderMail, plural } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { expireHoldOffers } from './holds.service';
import { finishJobRun, startJobRun } from '../../jobs/job-runs.repo';
import { activeLeads, claimReminder } from './overdue.repo';
import { chapterDay } from '@shared/time/chapter-time';
import { chapterCalendar, OVERDUE_JOB, overdueLoans, toMailLine } from './overdue.service';

export interface OverdueRunResult {
  summary: string;
  remindersSent: number;
  digestsSent: number;
  holdOffersExpired: number;
  error: string | null;
}

function summarize(r: Omit<OverdueRunResult, 'summary' | 'error'>, overdue: number): string {
  const parts = [plural(r.remindersSent, 'reminder', 'reminders')];
  parts.push(overdue === 0 ? 'nothing overdue, no digest' : `digest to ${plural(r.digestsSent, 'lead', 'leads')}`);
  if (r.holdOffersExpired > 0) parts.push(`${plural(r.holdOffersExpired, 'expired hold offer', 'expired hold offers')} moved on`);
  return parts.join(', ');
}

/**
 * The daily overdue run: moves expired hold offers on, reminds each holder of an overdue tool
 * (at most once a day per loan: only the call that inserts the day's reminder row queues the mail),
 * then writes every active lead a digest of all overdue tools. The mail goes to the outbox in the
 * run's transaction, so a mail server that is down delays it and loses none. Each run is recorded
 * in job_runs.
 */
export function runOverdueReminders(ctx: ServiceContext): OverdueRunResult {
  const startedAt = ctx.now();
  const runId = startJobRun(ctx.db, OVERDUE_JOB, startedAt);
  const counts = { remindersSent: 0, digestsSent: 0, holdOffersExpired: 0 };
  try {
    counts.holdOffersExpired = expireHoldOffers(ctx);
    const calendar = chapterCalendar(ctx);
    const { now } = calendar;
    const day = chapterDay(now, calendar.zone);
    const overdue = overdueLoans(ctx, calendar);
    ctx.db.transaction((db) => {
      for (const row of overdue) {
        if (!claimReminder(db, { loanId: row.loanId, day, sentAt: now, sentById: null })) continue;
        queueMail(db, overdueReminderMail(toMailLine(row, calendar), ctx.publicUrl, calendar), now);
        counts.remindersSent++;
      }
      if (overdue.length === 0) return;
      const lines = overdue.map((row) => toMailLine(row, calendar));
      for (const lead of activeLeads(db)) {
        queueMail(db, overdueDigestMail(lead.email, lead.name, lines, ctx.publicUrl, calendar), now);
        counts.digestsSent++;
      }
    });
    const result = { ...counts, summary: summarize(counts, overdue.length), error: null };
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: result.summary, error: null });
    return result;
  } catch (err) {
    const error = (err as Error).message || String(err);
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: 'Stopped; no reminders queued', error });
    throw err;
  }
}
