import type Stripe from 'stripe';
import type { RefusedCheckout } from '@shared/schemas/payments';
import { findUserById } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { OnlinePaymentRow } from '../../db/schema/payments';
import { activePeopleWithRole } from '../../jobs/job-runs.repo';
import type { Logger } from '../../lib/logger';
import { refusedPaymentMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { closeOnlinePayment, refusedOnlinePayments } from './payments.repo';

/** The lead's Payments page, where refused checkouts are listed. */
const paymentsPage = (ctx: ServiceContext) => `${ctx.publicUrl}/payments`;

/**
 * Refuses a completion whose amount or currency differs from the checkout Gripline opened: keeps
 * what the provider reported, logs it, and mails every active lead (in the caller's transaction)
 * so the money the provider took is settled with the member.
 */
export function refuseCheckout(ctx: ServiceContext, tx: Executor, logger: Logger, row: OnlinePaymentRow, eventId: string, session: Stripe.Checkout.Session, now: Date): void {
  const received = { amountCents: session.amount_total, currency: session.currency };
  closeOnlinePayment(tx, row.id, { state: 'refused', eventId, receivedAmountCents: received.amountCents, receivedCurrency: received.currency, updatedAt: now });
  logger.warn(
    { sessionId: session.id, eventId, userId: row.userId, expected: { amountCents: row.amountCents, currency: row.currency }, received },
    'an online payment was refused: its amount does not match the checkout',
  );
  const member = findUserById(tx, row.userId)!;
  const line = { memberName: member.name, askedCents: row.amountCents, currency: row.currency, receivedCents: received.amountCents, receivedCurrency: received.currency };
  for (const lead of activePeopleWithRole(tx, 'lead')) queueMail(tx, refusedPaymentMail(lead.email, lead.name, line, paymentsPage(ctx)), now);
}

/** Refused checkouts, newest first (quartermaster and lead). */
export function listRefusedCheckouts(ctx: ServiceContext): RefusedCheckout[] {
  return refusedOnlinePayments(ctx.db).map(({ payment, member }) => ({
    id: payment.id,
    member,
    askedCents: payment.amountCents,
    currency: payment.currency,
    receivedCents: payment.receivedAmountCents,
    receivedCurrency: payment.receivedCurrency,
    at: payment.updatedAt.toISOString(),
    sessionId: payment.sessionId,
  }));
}
