import type { ServiceContext } from '../../context';
import { overdueDigestMail, overdueReminderMail, plural } from '../../mail/messages';
import { expireHoldOffers } from './holds.service';
import { finishJobRun, startJobRun } from '../../jobs/job-runs.repo';
import { activeLeads, claimReminder, releaseReminder } from './overdue.repo';
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
 * (at most once a day per loan: only the call that inserts the day's reminder row sends the mail),
 * then sends every active lead a digest of all overdue tools. Each run is recorded in job_runs.
 * A failed e-mail is noted in the run's error and does not stop the others.
 */
export async function runOverdueReminders(ctx: ServiceContext): Promise<OverdueRunResult> {
  const startedAt = ctx.now();
  const runId = startJobRun(ctx.db, OVERDUE_JOB, startedAt);
  const failures: string[] = [];
  const counts = { remindersSent: 0, digestsSent: 0, holdOffersExpired: 0 };
  try {
    counts.holdOffersExpired = await expireHoldOffers(ctx);
    const calendar = chapterCalendar(ctx);
    const { now } = calendar;
    const day = chapterDay(now, calendar.zone);
    const overdue = overdueLoans(ctx, calendar);
    for (const row of overdue) {
      if (!claimReminder(ctx.db, { loanId: row.loanId, day, sentAt: now, sentById: null })) continue;
      try {
        await ctx.mailer.send(overdueReminderMail(toMailLine(row, calendar), ctx.publicUrl, calendar));
        counts.remindersSent++;
      } catch (err) {
        releaseReminder(ctx.db, row.loanId, day);
        failures.push(`reminder for ${row.tool.code} to ${row.holder.email}: ${(err as Error).message}`);
      }
    }
    if (overdue.length > 0) {
      const lines = overdue.map((row) => toMailLine(row, calendar));
      for (const lead of activeLeads(ctx.db)) {
        try {
          await ctx.mailer.send(overdueDigestMail(lead.email, lead.name, lines, ctx.publicUrl, calendar));
          counts.digestsSent++;
        } catch (err) {
          failures.push(`digest to ${lead.email}: ${(err as Error).message}`);
        }
      }
    }
    const result = { ...counts, summary: summarize(counts, overdue.length), error: failures.length ? `Could not send ${failures.join('; ')}` : null };
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: result.summary, error: result.error });
    return result;
  } catch (err) {
    const error = (err as Error).message || String(err);
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: `Stopped after ${plural(counts.remindersSent, 'reminder', 'reminders')}`, error });
    throw err;
  }
}
