import { Cron } from 'croner';
import type { ServiceContext } from '../../context';
import { atChapterHour, HOURLY } from '../../jobs/chapter-hour';
import type { Logger } from '../../lib/logger';
import { ALERT_DIGEST_JOB, runAlertDigest } from './alert-digest';
import { refreshIfStale } from './alerts.service';

/** Daily at 07:00 on the chapter's clock, with the crib's overdue run: the morning's list before the hangar opens. */
const ALERT_DIGEST_HOUR = 7;

/** Every 5 minutes: alerts follow draws and plans within minutes, without a GET having to write. */
export const ALERT_CHECK_SCHEDULE = '*/5 * * * *';
export const ALERT_CHECK_JOB = 'reorder-alert-check';

/** Starts planning's timed jobs. A failing run is logged and the schedule goes on; `protect` skips overlapping ticks. */
export function startPlanningScheduler(ctx: ServiceContext, logger: Logger): { stop(): void } {
  const digest = atChapterHour(ctx, ALERT_DIGEST_HOUR, () => runAlertDigest(ctx));
  const job = new Cron(HOURLY, { name: ALERT_DIGEST_JOB, protect: true, unref: true }, async () => {
    try {
      const result = await digest();
      if (result) logger.info({ job: ALERT_DIGEST_JOB, result }, 'scheduled job finished');
    } catch (err) {
      logger.error({ job: ALERT_DIGEST_JOB, err }, 'scheduled job failed');
    }
  });
  const check = new Cron(ALERT_CHECK_SCHEDULE, { name: ALERT_CHECK_JOB, protect: true, unref: true }, () => {
    try {
      if (refreshIfStale(ctx)) logger.debug({ job: ALERT_CHECK_JOB }, 'reorder alerts checked');
    } catch (err) {
      logger.error({ job: ALERT_CHECK_JOB, err }, 'scheduled job failed');
    }
  });
  return {
    stop: () => {
      job.stop();
      check.stop();
    },
  };
}
