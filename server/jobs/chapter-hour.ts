import { chapterHour } from '@shared/time/chapter-time';
import type { ServiceContext } from '../context';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/**
 * A daily job on the chapter's clock. The scheduler ticks every hour on the hour, and the job runs
 * only in its chapter hour: so it follows the zone a lead sets without a restart, and a clock
 * change moves it with the chapter's wall clock. Answers undefined in every other hour.
 */
export function atChapterHour<T>(ctx: ServiceContext, hour: number, run: () => T | Promise<T>): () => Promise<T | undefined> {
  return async () => (chapterHour(ctx.now(), readChapterTimeZone(ctx.db)) === hour ? await run() : undefined);
}

/** Every hour on the hour: the tick a daily job on the chapter's clock waits for. */
export const HOURLY = '0 * * * *';
