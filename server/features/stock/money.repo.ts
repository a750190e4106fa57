import { and, desc, eq, gte, inArray, isNotNull, isNull, lt, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { Executor } from '../../db/client';
import { bins, memberPayments, paymentRefunds, stockMovements, type PaymentRefundRow } from '../../db/schema/stock';
import { users } from '../../db/schema/users';
import type { PaymentMethod } from '@shared/schemas/payment-methods';

/** The entry a reversal undoes. */
const undone = alias(stockMovements, 'undone');
const recorder = alias(users, 'recorder');
const payer = alias(users, 'payer');

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

/** What has been handed back on a payment so far, in cents. */
const refundedCents = sql<number>`coalesce((select sum(${paymentRefunds.amountCents}) from ${paymentRefunds} where ${paymentRefunds.memberPaymentId} = ${memberPayments.id}), 0)`;

const paymentsWithRecorder = (db: Executor) =>
  db
    .select({ p: memberPayments, recordedByName: recorder.name, memberName: payer.name, refundedCents })
    .from(memberPayments)
    .innerJoin(recorder, eq(recorder.id, memberPayments.recordedById))
    .innerJoin(payer, eq(payer.id, memberPayments.userId));

/** A person's payments, newest first. */
export function paymentsOf(db: Executor, userId: number) {
  return paymentsWithRecorder(db).where(eq(memberPayments.userId, userId)).orderBy(desc(memberPayments.at), desc(memberPayments.id)).all();
}
export type PaymentRow = ReturnType<typeof paymentsOf>[number];

export function paymentById(db: Executor, id: number): PaymentRow | undefined {
  return paymentsWithRecorder(db).where(eq(memberPayments.id, id)).get();
}

export interface PaymentFilter {
  /** From this moment on (inclusive). */
  from?: Date;
  /** Before this moment (exclusive). */
  to?: Date;
  method?: PaymentMethod;
}

/** Everyone's payments, cash and online, newest first. */
export function listPayments(db: Executor, filter: PaymentFilter): PaymentRow[] {
  const where: SQL[] = [];
  if (filter.from) where.push(gte(memberPayments.at, filter.from));
  if (filter.to) where.push(lt(memberPayments.at, filter.to));
  if (filter.method) where.push(eq(memberPayments.method, filter.method));
  return paymentsWithRecorder(db)
    .where(and(...where))
    .orderBy(desc(memberPayments.at), desc(memberPayments.id))
    .all();
}

/**
 * Money paid in, one member or everyone: each payment (positive) at its time and each refund
 * (negative) at the time it was made, so a refund counts in its own month.
 */
export function paidEntries(db: Executor, userId?: number): { userId: number; cents: number; at: Date }[] {
  const whose = userId === undefined ? undefined : eq(memberPayments.userId, userId);
  const paid = db.select({ userId: memberPayments.userId, cents: memberPayments.amountCents, at: memberPayments.at }).from(memberPayments).where(whose).all();
  const refunded = db
    .select({ userId: memberPayments.userId, cents: sql<number>`-${paymentRefunds.amountCents}`, at: paymentRefunds.at })
    .from(paymentRefunds)
    .innerJoin(memberPayments, eq(memberPayments.id, paymentRefunds.memberPaymentId))
    .where(whose)
    .all();
  return [...paid, ...refunded];
}

/** A refund, once: a second one with the same provider refund id inserts nothing (undefined). */
export function insertRefund(db: Executor, values: typeof paymentRefunds.$inferInsert): PaymentRefundRow | undefined {
  return db.insert(paymentRefunds).values(values).onConflictDoNothing({ target: paymentRefunds.providerRefundId }).returning().get();
}

export function refundByProviderId(db: Executor, providerRefundId: string): PaymentRefundRow | undefined {
  return db.select().from(paymentRefunds).where(eq(paymentRefunds.providerRefundId, providerRefundId)).get();
}

/** Names who made a refund that the provider's webhook recorded first, without anyone's name. */
export function claimRefund(db: Executor, id: number, recordedById: number, note: string): void {
  db.update(paymentRefunds).set({ recordedById, note }).where(and(eq(paymentRefunds.id, id), isNull(paymentRefunds.recordedById))).run();
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
