import { eq } from 'drizzle-orm';
import { isTimeZone, serverTimeZone } from '@shared/time/chapter-time';
import type { Executor } from '../db/client';
import { settings } from '../db/schema/crib-jobs';

const KEY = 'timeZone';

/**
 * The chapter's IANA time zone, in which every due date, "days late", digest and reminder counts
 * its days. Until a lead chooses one it is the server's zone (or TZ when set).
 */
export function readChapterTimeZone(db: Executor): string {
  const stored = db.select({ value: settings.value }).from(settings).where(eq(settings.key, KEY)).get()?.value;
  return stored && isTimeZone(stored) ? stored : serverTimeZone();
}

/** Stores a zone already checked by the settings schema. */
export function writeChapterTimeZone(db: Executor, zone: string): void {
  db.insert(settings).values({ key: KEY, value: zone }).onConflictDoUpdate({ target: settings.key, set: { value: zone } }).run();
}
