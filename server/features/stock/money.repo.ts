import { and, desc, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { Executor } from '../../db/client';
import { bins, memberPayments, stockMovements } from '../../db/schema/stock';
import { users } from '../../db/schema/users';

/** The entry a reversal undoes. */
const undone = alias(stockMovements, 'undone');
const recorder = alias(users, 'recorder');

/**
 * When an entry counts: its own time, or for a reversal the time of the entry it undoes, so a
 * corrected mistake leaves its month as if it had never happened. Milliseconds since the epoch.
 */
const countsAt = sql<number>`coalesce(${undone.at}, ${stockMovements.at})`;
/** What an entry is for money: its own kind, or for a reversal the kind of the entry it undoes. */
const countsAs = sql<string>`coalesce(${undone.kind}, ${stockMovements.kind})`;

const TAB_KINDS = ['draw', 'return_unused', 'reversal'] as const;

/** Entries on members' tabs (draws, returns and their reversals), oldest first; one member or everyone. */
export function tabEntries(db: Executor, memberId?: number) {
  return db
    .select({ m: stockMovements, bin: bins, countsAt })
    .from(stockMovements)
    .innerJoin(bins, eq(bins.id, stockMovements.binId))
    .leftJoin(undone, eq(undone.id, stockMovements.reversesId))
    .where(
      and(
        memberId === undefined ? isNotNull(stockMovements.memberId) : eq(stockMovements.memberId, memberId),
        inArray(stockMovements.kind, TAB_KINDS),
      ),
    )
    .orderBy(stockMovements.at, stockMovements.id)
    .all();
}
export type TabEntryRow = ReturnType<typeof tabEntries>[number];

const paymentsWithRecorder = (db: Executor) =>
  db
    .select({ p: memberPayments, recordedByName: recorder.name })
    .from(memberPayments)
    .innerJoin(recorder, eq(recorder.id, memberPayments.recordedById));

/** A person's payments, newest first. */
export function paymentsOf(db: Executor, userId: number) {
  return paymentsWithRecorder(db).where(eq(memberPayments.userId, userId)).orderBy(desc(memberPayments.at), desc(memberPayments.id)).all();
}
export type PaymentRow = ReturnType<typeof paymentsOf>[number];

export function paymentById(db: Executor, id: number): PaymentRow | undefined {
  return paymentsWithRecorder(db).where(eq(memberPayments.id, id)).get();
}

/** Total paid per person, for everyone who has paid anything. */
export function paidByPerson(db: Executor): Map<number, number> {
  const rows = db
    .select({ userId: memberPayments.userId, cents: sql<number>`sum(${memberPayments.amountCents})` })
    .from(memberPayments)
    .groupBy(memberPayments.userId)
    .all();
  return new Map(rows.map((r) => [r.userId, r.cents]));
}

export function insertPayment(db: Executor, values: typeof memberPayments.$inferInsert) {
  return db.insert(memberPayments).values(values).returning().get();
}

export function namesOf(db: Executor, ids: number[]): Map<number, string> {
  if (ids.length === 0) return new Map();
  const rows = db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, ids)).all();
  return new Map(rows.map((r) => [r.id, r.name]));
}

/**
 * Every entry that counts from `from` on, with its bin's kind, for the chapter's spend. Transfers
 * between bins are left out: they move stock, they do not buy or use it.
 */
export function spendEntries(db: Executor, from: Date) {
  return db
    .select({ quantity: stockMovements.quantity, unitCostE4: stockMovements.unitCostE4, binKind: bins.kind, countsAt, countsAs })
    .from(stockMovements)
    .innerJoin(bins, eq(bins.id, stockMovements.binId))
    .leftJoin(undone, eq(undone.id, stockMovements.reversesId))
    .where(and(sql`${countsAt} >= ${from.getTime()}`, sql`${countsAs} not in ('transfer_in', 'transfer_out')`))
    .all();
}
export type SpendEntryRow = ReturnType<typeof spendEntries>[number];
