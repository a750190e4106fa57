import { Cron } from 'croner';
import type { ServiceContext } from '../../context';
import type { Logger } from '../../lib/logger';
import { ALERT_DIGEST_JOB, runAlertDigest } from './alert-digest';

/** Daily at 07:00 server local time, with the crib's overdue run: the morning's list before the hangar opens. */
const ALERT_DIGEST_SCHEDULE = '0 7 * * *';

/** Starts planning's timed job. A failing run is logged and the schedule goes on; `protect` skips overlapping ticks. */
export function startPlanningScheduler(ctx: ServiceContext, logger: Logger): { stop(): void } {
  const job = new Cron(ALERT_DIGEST_SCHEDULE, { name: ALERT_DIGEST_JOB, protect: true, unref: true }, () => {
    try {
      const result = runAlertDigest(ctx);
      logger.info({ job: ALERT_DIGEST_JOB, result }, 'scheduled job finished');
    } catch (err) {
      logger.error({ job: ALERT_DIGEST_JOB, err }, 'scheduled job failed');
    }
  });
  return { stop: () => job.stop() };
}
