import { sql } from 'drizzle-orm';
import { check, index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { bins, stockMovements } from './stock';
import { users } from './users';

const nowMs = sql`(cast(unixepoch('subsec') * 1000 as integer))`;

/** A member's project: a two-seat kit, a tool chest. */
export const builds = sqliteTable(
  'builds',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    ownerId: integer()
      .notNull()
      .references(() => users.id),
    name: text().notNull(),
    description: text().notNull().default(''),
    /** The build's own minimum edge distance in inches (kit standards often set one), or none. */
    edgeFloorIn: real(),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
  },
  (t) => [index('builds_owner_idx').on(t.ownerId)],
);

/**
 * A part of a build riveted as one job (rudder, elevator, a lid). Rivet lines and extra items are
 * JSON checked by the shared schemas: they are read and written whole with their assembly.
 */
export const assemblies = sqliteTable(
  'assemblies',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    buildId: integer()
      .notNull()
      .references(() => builds.id),
    name: text().notNull(),
    status: text({ enum: ['planned', 'in_progress', 'done'] }).notNull().default('planned'),
    plannedStart: integer({ mode: 'timestamp_ms' }),
    plannedFinish: integer({ mode: 'timestamp_ms' }),
    unit: text({ enum: ['in', 'mm'] }).notNull().default('in'),
    lines: text().notNull().default('[]'),
    extraItems: text().notNull().default('[]'),
    notes: text().notNull().default(''),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
    updatedAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
  },
  (t) => [
    index('assemblies_build_idx').on(t.buildId),
    index('assemblies_status_idx').on(t.status),
    check('assemblies_status_check', sql`${t.status} in ('planned', 'in_progress', 'done')`),
    check('assemblies_dates_check', sql`${t.plannedStart} is null or ${t.plannedFinish} is null or ${t.plannedFinish} >= ${t.plannedStart}`),
  ],
);

/**
 * A reorder alert: at most one open or ordered per bin. open → ordered (expected date and quantity,
 * which count as expected receipts) → closed by the receipt; or dismissed with a reason.
 */
export const binAlerts = sqliteTable(
  'bin_alerts',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    binId: integer()
      .notNull()
      .references(() => bins.id),
    state: text({ enum: ['open', 'ordered', 'closed', 'dismissed'] }).notNull().default('open'),
    raisedAt: integer({ mode: 'timestamp_ms' }).notNull(),
    reason: text().notNull(),
    onHandAtRaise: integer().notNull(),
    reorderPoint: integer().notNull(),
    safetyStock: integer().notNull(),
    suggestedQty: integer().notNull(),
    orderedAt: integer({ mode: 'timestamp_ms' }),
    orderedById: integer().references(() => users.id),
    orderedQty: integer(),
    /** Received against the order so far: a partial receipt keeps the rest on order. */
    receivedQty: integer().notNull().default(0),
    expectedAt: integer({ mode: 'timestamp_ms' }),
    closedAt: integer({ mode: 'timestamp_ms' }),
    closedByMovementId: integer().references(() => stockMovements.id),
    /** The quartermaster who closed an order by hand (the rest will not come); null when a receipt closed it. */
    closedById: integer().references(() => users.id),
    dismissedAt: integer({ mode: 'timestamp_ms' }),
    dismissedById: integer().references(() => users.id),
    dismissReason: text(),
  },
  (t) => [
    uniqueIndex('bin_alerts_one_active_per_bin').on(t.binId).where(sql`${t.state} in ('open', 'ordered')`),
    index('bin_alerts_state_idx').on(t.state),
    check('bin_alerts_state_check', sql`${t.state} in ('open', 'ordered', 'closed', 'dismissed')`),
  ],
);

export type BuildRow = typeof builds.$inferSelect;
export type AssemblyRow = typeof assemblies.$inferSelect;
export type BinAlertRow = typeof binAlerts.$inferSelect;
