import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { onlinePayments, type OnlinePaymentRow } from '../../db/schema/payments';
import { users } from '../../db/schema/users';

export function insertOnlinePayment(db: Executor, values: typeof onlinePayments.$inferInsert): OnlinePaymentRow {
  return db.insert(onlinePayments).values(values).returning().get();
}

export function onlinePaymentBySession(db: Executor, sessionId: string): OnlinePaymentRow | undefined {
  return db.select().from(onlinePayments).where(eq(onlinePayments.sessionId, sessionId)).get();
}

/**
 * The one move of a checkout's state: open → paid, refused or expired, naming the provider's event
 * that did it (a checkout Gripline expired itself has none); false when it was no longer open.
 */
export function closeOnlinePayment(
  db: Executor,
  id: number,
  changes: {
    state: 'paid' | 'refused' | 'expired';
    eventId?: string;
    paymentIntentId?: string | null;
    receivedAmountCents?: number | null;
    receivedCurrency?: string | null;
    updatedAt: Date;
  },
): boolean {
  return db
    .update(onlinePayments)
    .set(changes)
    .where(and(eq(onlinePayments.id, id), eq(onlinePayments.state, 'open')))
    .run().changes === 1;
}

/** Names the payment on the member's tab that a paid checkout became (stock tells it, `tab.online_payment_recorded`). */
export function linkMemberPayment(db: Executor, id: number, memberPaymentId: number): void {
  db.update(onlinePayments).set({ memberPaymentId }).where(eq(onlinePayments.id, id)).run();
}

/** The member's checkouts still open at the provider, oldest first. */
export function openOnlinePaymentsOf(db: Executor, userId: number): OnlinePaymentRow[] {
  return db
    .select()
    .from(onlinePayments)
    .where(and(eq(onlinePayments.userId, userId), eq(onlinePayments.state, 'open')))
    .orderBy(onlinePayments.id)
    .all();
}

/** The paid checkout behind a payment on a tab, if it was paid online. */
export function onlinePaymentByMemberPayment(db: Executor, memberPaymentId: number): OnlinePaymentRow | undefined {
  return db.select().from(onlinePayments).where(eq(onlinePayments.memberPaymentId, memberPaymentId)).get();
}

/** The paid checkout that made a provider payment (what a refund names). */
export function onlinePaymentByIntent(db: Executor, paymentIntentId: string): OnlinePaymentRow | undefined {
  return db.select().from(onlinePayments).where(eq(onlinePayments.paymentIntentId, paymentIntentId)).get();
}

/** Checkouts whose completion was refused, with their member, newest refusal first. */
export function refusedOnlinePayments(db: Executor) {
  return db
    .select({ payment: onlinePayments, member: { id: users.id, name: users.name } })
    .from(onlinePayments)
    .innerJoin(users, eq(users.id, onlinePayments.userId))
    .where(eq(onlinePayments.state, 'refused'))
    .orderBy(desc(onlinePayments.updatedAt), desc(onlinePayments.id))
    .all();
}
