import { isTimeZone, serverTimeZone } from '@shared/time/chapter-time';
import type { Database, Executor } from '../db/client';
import { preparedPerDatabase } from '../db/prepared';
import { settings } from '../db/schema/crib-jobs';

const KEY = 'timeZone';

/** Read on every checkout and scan, so prepared once per database like the other hot statements. */
const statements = preparedPerDatabase((db) => ({
  zone: db.$client.prepare<[string], { value: string }>('select value from settings where key = ?'),
}));

const known = new Set<string>();
const knownZone = (zone: string): boolean => known.has(zone) || (isTimeZone(zone) && known.add(zone).has(zone));

/**
 * The chapter's IANA time zone, in which every due date, "days late", digest and reminder counts
 * its days. Until a lead chooses one it is the server's zone (or TZ when set).
 */
export function readChapterTimeZone(db: Database): string {
  const stored = statements(db).zone.get(KEY)?.value;
  return stored && knownZone(stored) ? stored : serverTimeZone();
}

/** Stores a zone already checked by the settings schema. */
export function writeChapterTimeZone(db: Executor, zone: string): void {
  db.insert(settings).values({ key: KEY, value: zone }).onConflictDoUpdate({ target: settings.key, set: { value: zone } }).run();
}
