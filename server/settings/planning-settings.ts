import { inArray } from 'drizzle-orm';
import type { Executor } from '../db/client';
import { settings } from '../db/schema/crib-jobs';

/** The chapter's planning settings with their defaults; stored as text in the settings table. */
export const PLANNING_SETTING_DEFAULTS = {
  /** Rivets drilled out or dropped, as a percentage of each need (common practice: about 5 %). */
  wastePercent: 5,
  /** The widest pitch before a warning, in rivet diameters (sources say 8D or 10D). */
  maxPitchDiameters: 10,
  /** Chance of not running out during a lead time, for safety stock. */
  serviceLevel: 0.95,
  /** Cost of placing one order, in dollars (S in the order quantity). */
  orderCost: 15,
  /** Holding cost per year as a fraction of unit cost (H = rate × unit cost). */
  holdingRate: 0.25,
} as const;
export type PlanningSettings = { [K in keyof typeof PLANNING_SETTING_DEFAULTS]: number };
const KEYS = Object.keys(PLANNING_SETTING_DEFAULTS) as (keyof PlanningSettings)[];

export function readPlanningSettings(db: Executor): PlanningSettings {
  const rows = db.select().from(settings).where(inArray(settings.key, KEYS)).all();
  const stored = new Map(rows.map((r) => [r.key, Number(r.value)]));
  return Object.fromEntries(
    KEYS.map((k) => {
      const v = stored.get(k);
      return [k, v !== undefined && Number.isFinite(v) ? v : PLANNING_SETTING_DEFAULTS[k]];
    }),
  ) as PlanningSettings;
}

export function writePlanningSettings(db: Executor, values: Partial<PlanningSettings>): void {
  for (const [key, value] of Object.entries(values)) {
    if (value === undefined) continue;
    db.insert(settings)
      .values({ key, value: String(value) })
      .onConflictDoUpdate({ target: settings.key, set: { value: String(value) } })
      .run();
  }
}
