import { sql } from 'drizzle-orm';
import { blob, check, index, integer, real, sqliteTable, text, uniqueIndex, type AnySQLiteColumn } from 'drizzle-orm/sqlite-core';
import { BIN_KINDS, MOVEMENT_KINDS, RIVET_HEADS } from '@shared/stock/kinds';
import { PAYMENT_METHODS } from '@shared/schemas/payment-methods';
import { stations } from './stations';
import { users } from './users';

const nowMs = sql`(cast(unixepoch('subsec') * 1000 as integer))`;
const inList = (values: readonly string[]) => sql.raw(values.map((v) => `'${v}'`).join(', '));

/**
 * A bin of consumables on the shelf. onHand is kept in the same transaction as every ledger entry
 * and always equals the sum of the bin's movements (tests prove it); it can never go below zero.
 * Money per unit is kept in hundredths of a cent (unitCostE4 = dollars x 10,000).
 */
export const bins = sqliteTable(
  'bins',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    code: text().notNull(),
    kind: text({ enum: BIN_KINDS }).notNull(),
    name: text().notNull().default(''),
    unit: text().notNull().default('each'),
    packSize: integer().notNull().default(1),
    unitCostE4: integer().notNull().default(0),
    supplier: text().notNull().default(''),
    supplierPart: text().notNull().default(''),
    leadTimeDays: integer().notNull().default(14),
    reorderPoint: integer().notNull().default(0),
    reorderQty: integer().notNull().default(0),
    location: text().notNull().default(''),
    notes: text().notNull().default(''),
    head: text({ enum: RIVET_HEADS }),
    material: text(),
    stemMaterial: text(),
    diameter32: integer(),
    grip16: integer(),
    /** Blind rivets: the grip range the maker gives on the box, in inches (the table's band for the dash unless set). */
    gripMin: real(),
    gripMax: real(),
    length16: real(),
    drillSize: text(),
    holeDrill: text(),
    onHand: integer().notNull().default(0),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
    updatedAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
  },
  (t) => [
    uniqueIndex('bins_code_unique').on(t.code),
    index('bins_kind_idx').on(t.kind),
    check('bins_kind_check', sql`${t.kind} in (${inList(BIN_KINDS)})`),
    check('bins_on_hand_check', sql`${t.onHand} >= 0`),
    check('bins_pack_check', sql`${t.packSize} >= 1`),
    check('bins_cost_check', sql`${t.unitCostE4} >= 0`),
  ],
);

/** Packing slips (PDF or image, checked by content) attached to receipts. */
export const stockSlips = sqliteTable('stock_slips', {
  id: integer().primaryKey({ autoIncrement: true }),
  contentType: text().notNull(),
  filename: text().notNull(),
  bytes: blob({ mode: 'buffer' }).notNull(),
  uploadedById: integer()
    .notNull()
    .references(() => users.id),
  createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(nowMs),
});

/**
 * The ledger: one immutable row per change of quantity. Triggers in the migration refuse UPDATE
 * and DELETE; a mistake is undone by a reversal that names the entry it reverses (once only).
 */
export const stockMovements = sqliteTable(
  'stock_movements',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    binId: integer()
      .notNull()
      .references(() => bins.id),
    kind: text({ enum: MOVEMENT_KINDS }).notNull(),
    quantity: integer().notNull(),
    balanceAfter: integer().notNull(),
    unitCostE4: integer().notNull(),
    /** When it happened: for a draw or return queued offline, the member's phone time (clamped). */
    at: integer({ mode: 'timestamp_ms' }).notNull(),
    /** When the entry reached the server (null before this was kept); id order is arrival order. */
    arrivedAt: integer({ mode: 'timestamp_ms' }),
    actorId: integer()
      .notNull()
      .references(() => users.id),
    /** Draws and returns: whose tab they go on. */
    memberId: integer().references(() => users.id),
    /** The assembly a draw is for (assemblies are planned elsewhere; no foreign key on purpose). */
    assemblyId: integer(),
    note: text().notNull().default(''),
    reversesId: integer().references((): AnySQLiteColumn => stockMovements.id),
    /** Transfers: the entry on the other bin. */
    pairedId: integer(),
    slipId: integer().references(() => stockSlips.id),
    /** Made at a crib station (by `actorId`, signed in there with badge and PIN); null elsewhere. */
    stationId: integer().references(() => stations.id),
  },
  (t) => [
    index('stock_movements_bin_idx').on(t.binId, t.at),
    index('stock_movements_member_idx').on(t.memberId, t.at),
    index('stock_movements_at_idx').on(t.at),
    uniqueIndex('stock_movements_reversed_once').on(t.reversesId).where(sql`${t.reversesId} is not null`),
    check('stock_movements_kind_check', sql`${t.kind} in (${inList(MOVEMENT_KINDS)})`),
    check('stock_movements_balance_check', sql`${t.balanceAfter} >= 0`),
    check('stock_movements_quantity_check', sql`${t.quantity} <> 0 or ${t.kind} = 'count'`),
  ],
);

/**
 * Money a member paid towards their consumables tab: cash recorded by the lead or quartermaster,
 * or an online payment recorded when the provider confirmed it.
 */
export const memberPayments = sqliteTable(
  'member_payments',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    userId: integer()
      .notNull()
      .references(() => users.id),
    amountCents: integer().notNull(),
    at: integer({ mode: 'timestamp_ms' }).notNull(),
    note: text().notNull().default(''),
    recordedById: integer()
      .notNull()
      .references(() => users.id),
    method: text({ enum: PAYMENT_METHODS }).notNull().default('cash'),
  },
  (t) => [
    index('member_payments_user_idx').on(t.userId, t.at),
    index('member_payments_at_idx').on(t.at),
    check('member_payments_amount_check', sql`${t.amountCents} > 0`),
    check('member_payments_method_check', sql`${t.method} in (${inList(PAYMENT_METHODS)})`),
  ],
);

/**
 * Money handed back on a member payment (online payments only: refunded through the provider).
 * It counts against what was paid in the month it was made. `providerRefundId` makes a refund
 * recorded once, whether Gripline made it or the provider's dashboard did (then recordedById is null).
 */
export const paymentRefunds = sqliteTable(
  'payment_refunds',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    memberPaymentId: integer()
      .notNull()
      .references(() => memberPayments.id),
    amountCents: integer().notNull(),
    at: integer({ mode: 'timestamp_ms' }).notNull(),
    providerRefundId: text().unique(),
    recordedById: integer().references(() => users.id),
    note: text().notNull().default(''),
  },
  (t) => [
    index('payment_refunds_payment_idx').on(t.memberPaymentId),
    index('payment_refunds_at_idx').on(t.at),
    check('payment_refunds_amount_check', sql`${t.amountCents} > 0`),
  ],
);

export type BinRow = typeof bins.$inferSelect;
export type MovementRow = typeof stockMovements.$inferSelect;
export type PaymentRefundRow = typeof paymentRefunds.$inferSelect;
/** A refund to record: always with the provider's refund id, which records it once. */
export type NewPaymentRefund = Omit<typeof paymentRefunds.$inferInsert, 'id' | 'providerRefundId'> & { providerRefundId: string };
