import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { badges } from './badges';
import { users } from './users';

/**
 * A device enrolled by a quartermaster as a crib station (a shared tablet at the crib door). The
 * browser keeps the station token; only its SHA-256 is stored. A revoked station signs nobody in.
 */
export const stations = sqliteTable(
  'stations',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    name: text().notNull(),
    tokenHash: text().notNull(),
    enrolledById: integer()
      .notNull()
      .references(() => users.id),
    enrolledAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
    revokedAt: integer({ mode: 'timestamp_ms' }),
    revokedById: integer().references(() => users.id),
  },
  (t) => [uniqueIndex('stations_hash_unique').on(t.tokenHash)],
);

export type StationRow = typeof stations.$inferSelect;

/** A wrong PIN typed for a badge at a station: enough of them within a while lock that badge there. */
export const stationPinFailures = sqliteTable(
  'station_pin_failures',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    stationId: integer()
      .notNull()
      .references(() => stations.id),
    badgeId: integer()
      .notNull()
      .references(() => badges.id),
    at: integer({ mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('station_pin_failures_idx').on(t.stationId, t.badgeId, t.at)],
);
