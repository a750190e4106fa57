import { Cron } from 'croner';
import type { ServiceContext } from '../../context';
import { atChapterHour, HOURLY } from '../../jobs/chapter-hour';
import type { Logger } from '../../lib/logger';
import { expireHoldOffers } from './holds.service';
import { runOverdueReminders } from './reminder-job';

/** Daily at 07:00 on the chapter's clock: before the hangar opens, after the night. */
const OVERDUE_HOUR = 7;
/** Every 5 minutes, so a held tool goes to the next person soon after its offer runs out. */
const HOLD_OFFER_SCHEDULE = '*/5 * * * *';
/** Daily at 03:30 server local time, when nobody is at the bench. */
const HOUSEKEEPING_SCHEDULE = '30 3 * * *';

/** A nightly clean-up another feature owns (e.g. old idempotency keys); the app hands it in. */
export interface HousekeepingJob {
  name: string;
  run: () => unknown;
}

/**
 * Starts the tool crib's timed jobs. A failing run is logged and the schedule goes on; `protect`
 * skips a tick while the previous run of the same job is still going.
 */
export function startCribScheduler(ctx: ServiceContext, logger: Logger, housekeeping: readonly HousekeepingJob[] = []): { stop(): void } {
  const guarded = (name: string, run: () => Promise<unknown>) => async () => {
    try {
      const result = await run();
      // Hold offers are checked every few minutes; log only when something moved.
      if (result) logger.info({ job: name, result }, 'scheduled job finished');
    } catch (err) {
      logger.error({ job: name, err }, 'scheduled job failed');
    }
  };
  const jobs = [
    new Cron(HOURLY, { name: 'overdue-reminders', protect: true, unref: true }, guarded('overdue-reminders', atChapterHour(ctx, OVERDUE_HOUR, () => runOverdueReminders(ctx)))),
    new Cron(HOLD_OFFER_SCHEDULE, { name: 'expire-hold-offers', protect: true, unref: true }, guarded('expire-hold-offers', () => Promise.resolve().then(() => expireHoldOffers(ctx)))),
    ...housekeeping.map((job) => new Cron(HOUSEKEEPING_SCHEDULE, { name: job.name, protect: true, unref: true }, guarded(job.name, () => Promise.resolve().then(job.run)))),
  ];
  return {
    stop() {
      for (const job of jobs) job.stop();
    },
  };
}
