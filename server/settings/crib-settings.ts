import type { Executor } from '../db/client';
import { settings } from '../db/schema/crib-jobs';

/** Chapter settings with their defaults; stored as text in the settings table. */
export const CRIB_SETTING_DEFAULTS = {
  /** How long a returned tool waits for the first person in its hold queue. */
  holdHours: 48,
} as const;
export type CribSettings = { [K in keyof typeof CRIB_SETTING_DEFAULTS]: number };

export function readCribSettings(db: Executor): CribSettings {
  const rows = db.select().from(settings).all();
  const stored = new Map(rows.map((r) => [r.key, Number(r.value)]));
  const holdHours = stored.get('holdHours');
  return { holdHours: holdHours !== undefined && Number.isFinite(holdHours) ? holdHours : CRIB_SETTING_DEFAULTS.holdHours };
}

export function writeCribSetting(db: Executor, key: keyof CribSettings, value: number): void {
  db.insert(settings)
    .values({ key, value: String(value) })
    .onConflictDoUpdate({ target: settings.key, set: { value: String(value) } })
    .run();
}
