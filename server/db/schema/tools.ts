import { sql } from 'drizzle-orm';
import { blob, check, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { RIVET_SIZED_CATEGORIES, TOOL_CATEGORIES, TOOL_STATUSES } from '@shared/tools/categories';
import { signoffs } from './signoffs';
import { stations } from './stations';
import { users } from './users';

const nowMs = sql`(cast(unixepoch('subsec') * 1000 as integer))`;
const inList = (values: readonly string[]) => sql.raw(values.map((v) => `'${v}'`).join(', '));

export const tools = sqliteTable(
  'tools',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    code: text().notNull(),
    name: text().notNull(),
    category: text({ enum: TOOL_CATEGORIES }).notNull(),
    location: text().notNull().default(''),
    replacementValueCents: integer().notNull().default(0),
    /** Null: the category's default loan period. */
    loanDays: integer(),
    requiredSignoffId: integer().references(() => signoffs.id),
    serviceIntervalDays: integer(),
    lastServiceAt: integer({ mode: 'timestamp_ms' }),
    status: text({ enum: TOOL_STATUSES }).notNull().default('available'),
    statusNote: text(),
    /** Drill bits: the size name from the drill table ('#40', 'F', '1/8'); countersink cutters: their pilot. */
    drillSize: text(),
    /** Countersink cutters and dimple dies: the rivet diameter they are made for, in 32nds of an inch. */
    rivetDiameter32: integer(),
    /** Temporary fastener trays: fastener size in inches and how many a full tray holds. */
    traySize: text(),
    trayCapacity: integer(),
    /** JSON array of accessories that travel with the tool (e.g. a puller's nosepieces). */
    accessories: text().notNull().default('[]'),
    notes: text().notNull().default(''),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
    updatedAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
  },
  (t) => [
    uniqueIndex('tools_code_unique').on(t.code),
    index('tools_status_idx').on(t.status),
    index('tools_category_idx').on(t.category),
    check('tools_category_check', sql`${t.category} in (${inList(TOOL_CATEGORIES)})`),
    check('tools_status_check', sql`${t.status} in (${inList(TOOL_STATUSES)})`),
    check('tools_value_check', sql`${t.replacementValueCents} >= 0`),
    check('tools_loan_days_check', sql`${t.loanDays} is null or ${t.loanDays} between 1 and 365`),
    check('tools_tray_check', sql`${t.trayCapacity} is null or ${t.trayCapacity} > 0`),
    check('tools_rivet_size_check', sql`(${t.rivetDiameter32} is not null) = (${t.category} in (${inList(RIVET_SIZED_CATEGORIES)})) and (${t.rivetDiameter32} is null or ${t.rivetDiameter32} between 1 and 16)`),
  ],
);

/**
 * A loan: one person holds one tool from checkout until return. "On loan" means a row with no
 * returnedAt; the partial unique index makes a second open loan of the same tool impossible,
 * whatever two phones do at the same moment.
 */
export const loans = sqliteTable(
  'loans',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    userId: integer()
      .notNull()
      .references(() => users.id),
    /** When the member took it (a queued offline checkout: their phone's time, clamped); due counts from it. */
    checkedOutAt: integer({ mode: 'timestamp_ms' }).notNull(),
    dueAt: integer({ mode: 'timestamp_ms' }).notNull(),
    returnedAt: integer({ mode: 'timestamp_ms' }),
    returnedById: integer().references(() => users.id),
    returnCondition: text({ enum: ['ok', 'needs_attention'] }),
    returnNote: text(),
    /** Temporary fastener trays: how many came back, and how many short of a full tray. */
    returnedCount: integer(),
    shortfall: integer(),
    returnPhotoId: integer(),
    /** JSON array of the tool's accessories that went out with this loan; null when the checkout did not say (older loans). */
    accessoriesOut: text(),
    /** When the checkout and the return reached the server (later than the times above when queued offline; null before these were kept). */
    checkoutArrivedAt: integer({ mode: 'timestamp_ms' }),
    returnArrivedAt: integer({ mode: 'timestamp_ms' }),
  },
  (t) => [
    uniqueIndex('loans_one_open_per_tool').on(t.toolId).where(sql`${t.returnedAt} is null`),
    index('loans_user_idx').on(t.userId, t.returnedAt),
    index('loans_due_idx').on(t.returnedAt, t.dueAt),
    check('loans_due_check', sql`${t.dueAt} > ${t.checkedOutAt}`),
  ],
);

/** A queue of people waiting for a tool; the first one is offered the tool when it comes back. */
export const holds = sqliteTable(
  'holds',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    userId: integer()
      .notNull()
      .references(() => users.id),
    status: text({ enum: ['waiting', 'offered', 'fulfilled', 'cancelled', 'expired'] }).notNull().default('waiting'),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
    offeredAt: integer({ mode: 'timestamp_ms' }),
    offerExpiresAt: integer({ mode: 'timestamp_ms' }),
    closedAt: integer({ mode: 'timestamp_ms' }),
    /** A hold placed ahead (a kit for an assembly that starts later): nobody offers the tool to this person before then. */
    startsAt: integer({ mode: 'timestamp_ms' }),
  },
  (t) => [
    uniqueIndex('holds_one_active_per_person')
      .on(t.toolId, t.userId)
      .where(sql`${t.status} in ('waiting', 'offered')`),
    uniqueIndex('holds_one_offer_per_tool').on(t.toolId).where(sql`${t.status} = 'offered'`),
    index('holds_tool_idx').on(t.toolId, t.status, t.createdAt),
  ],
);

/** Who did what to a tool and when: every change of state, with from and to. */
export const toolEvents = sqliteTable(
  'tool_events',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    actorId: integer().references(() => users.id),
    at: integer({ mode: 'timestamp_ms' }).notNull(),
    action: text().notNull(),
    fromStatus: text(),
    toStatus: text(),
    detail: text().notNull().default(''),
    /** Taken at a crib station (by `actorId`, signed in there with badge and PIN); null elsewhere. */
    stationId: integer().references(() => stations.id),
  },
  (t) => [index('tool_events_tool_idx').on(t.toolId, t.at)],
);

/**
 * An accessory that did not come back with a loan (a puller's nosepiece, a gun's rivet set). Open
 * until the quartermaster marks it found or replaced; one open row per tool and accessory.
 */
export const missingAccessories = sqliteTable(
  'missing_accessories',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    loanId: integer()
      .notNull()
      .references(() => loans.id),
    accessory: text().notNull(),
    reportedAt: integer({ mode: 'timestamp_ms' }).notNull(),
    resolvedAt: integer({ mode: 'timestamp_ms' }),
    resolvedById: integer().references(() => users.id),
    resolution: text({ enum: ['found', 'replaced'] }),
  },
  (t) => [
    uniqueIndex('missing_accessories_one_open').on(t.toolId, t.accessory).where(sql`${t.resolvedAt} is null`),
    check('missing_accessories_resolution_check', sql`(${t.resolvedAt} is null) = (${t.resolution} is null)`),
  ],
);

/** Photos of tools and of returns, stored in the database with a small thumbnail. */
export const photos = sqliteTable(
  'photos',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    /** Re-encoded by the server (JPEG), never the uploaded bytes as they came. */
    image: blob({ mode: 'buffer' }).notNull(),
    thumbnail: blob({ mode: 'buffer' }).notNull(),
    width: integer().notNull(),
    height: integer().notNull(),
    uploadedById: integer().references(() => users.id),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
  },
  (t) => [index('photos_tool_idx').on(t.toolId)],
);
