import type Stripe from 'stripe';
import type { PaymentListItem, Refund, RefundBody } from '@shared/schemas/payments';
import { centsWords } from '@shared/stock/money';
import { findUserById } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';
import { publish, type EventOfType } from '../../events/domain-events';
import { HttpError } from '../../lib/http-error';
import type { Logger } from '../../lib/logger';
import { paymentRefundMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import type { PaymentsSetup } from '../../payments/payments-client';
import { tabBalanceCents, tabPayment, tabRefund, type TabRefund } from '../stock/stock.reads';
import { myTabPage } from './payments.service';
import { onlinePaymentByIntent, onlinePaymentByMemberPayment } from './payments.repo';
import { providerCall } from './provider-call';

const UNREACHABLE = 'The payment provider could not be reached, so nothing was refunded. Try again in a minute.';

/** The refunds that count: a failed or cancelled one handed nothing back. */
const handsMoneyBack = (r: Stripe.Refund) => r.status === 'succeeded' || r.status === 'pending';
const intentIdOf = (intent: string | Stripe.PaymentIntent | null) => (typeof intent === 'string' ? intent : (intent?.id ?? null));

/** How much to refund: the whole remainder unless less is asked; never more than is left. */
function amountToRefund(payment: PaymentListItem, asked: number | undefined): number {
  if (payment.method === 'cash') {
    throw new HttpError(409, 'CASH_PAYMENT', 'This payment was made in cash: hand the cash back in person. Only online payments are refunded through the provider.');
  }
  const left = payment.refundableCents;
  if (left <= 0) throw new HttpError(409, 'ALREADY_REFUNDED', `This payment of ${centsWords(payment.amountCents)} has been refunded in full.`);
  const amount = asked ?? left;
  if (amount > left) {
    throw new HttpError(400, 'ABOVE_REFUNDABLE', `Only ${centsWords(left)} of this payment is left to refund.`, [{ path: 'amountCents', message: `At most ${centsWords(left)}.` }]);
  }
  return amount;
}

type RefundEntry = Omit<EventOfType<'payment.refunded'>, 'type'>;

/**
 * Tells stock of a refund (`payment.refunded`: the member's balance goes back up) and, the first
 * time it is recorded, mails the member; in the caller's transaction.
 */
function recordRefundOnTab(ctx: ServiceContext, tx: Executor, entry: RefundEntry): TabRefund {
  const known = tabRefund(tx, entry.providerRefundId) !== undefined;
  publish(ctx, { type: 'payment.refunded', ...entry });
  const refund = tabRefund(tx, entry.providerRefundId)!;
  if (!known) {
    const payment = tabPayment(tx, entry.memberPaymentId)!;
    const member = findUserById(tx, payment.member.id)!;
    queueMail(tx, paymentRefundMail(member.email, member.name, refund.amountCents, tabBalanceCents(tx, member.id), myTabPage(ctx)), ctx.now());
  }
  return refund;
}

/**
 * The lead refunds an online payment (all that is left, or a part) through the provider's SDK,
 * then records it on the tab once: the provider's own `charge.refunded` event for the same refund
 * may have arrived first, and then it is not added again.
 */
export async function refundPayment(ctx: ServiceContext, setup: PaymentsSetup, lead: UserRow, paymentId: number, body: RefundBody): Promise<Refund> {
  const payment = tabPayment(ctx.db, paymentId);
  if (!payment) throw new HttpError(404, 'PAYMENT_NOT_FOUND', `There is no payment with id ${paymentId}. Choose one from the list of payments.`);
  const amountCents = amountToRefund(payment, body.amountCents);
  const paymentIntent = onlinePaymentByMemberPayment(ctx.db, payment.id)?.paymentIntentId;
  if (!paymentIntent) {
    throw new HttpError(409, 'NO_PROVIDER_PAYMENT', 'The provider never told Gripline which of its payments this was, so it cannot be refunded here. Refund it in the provider’s dashboard.');
  }
  const made = await providerCall(() => setup.provider.refunds.create({ payment_intent: paymentIntent, amount: amountCents, metadata: { memberPaymentId: String(payment.id) } }), UNREACHABLE);
  const refund = ctx.db.transaction((tx) =>
    recordRefundOnTab(ctx, tx, { memberPaymentId: payment.id, amountCents: made.amount, at: ctx.now(), providerRefundId: made.id, recordedById: lead.id, note: '' }),
  );
  const after = tabPayment(ctx.db, payment.id)!;
  return {
    id: refund.id,
    paymentId: payment.id,
    amountCents: refund.amountCents,
    at: refund.at.toISOString(),
    providerRefundId: refund.providerRefundId,
    refundedCents: after.refundedCents,
    refundableCents: after.refundableCents,
  };
}

/**
 * The provider's `charge.refunded`: every refund on the charge's payment is recorded once, by its
 * refund id, so one made in the provider's dashboard reaches the tab and one Gripline made (or
 * recorded already) is not counted twice. The event names the charge; its refunds are read
 * through the SDK.
 */
export async function recordChargeRefunds(ctx: ServiceContext, setup: PaymentsSetup, logger: Logger, charge: Stripe.Charge): Promise<void> {
  const intentId = intentIdOf(charge.payment_intent);
  const memberPaymentId = intentId ? onlinePaymentByIntent(ctx.db, intentId)?.memberPaymentId : undefined;
  if (!intentId || !memberPaymentId) {
    logger.warn({ chargeId: charge.id, paymentIntent: intentId }, 'a refund on a payment that Gripline did not record was ignored');
    return;
  }
  const refunds = await providerCall(() => setup.provider.refunds.list({ payment_intent: intentId, limit: 100 }), UNREACHABLE);
  ctx.db.transaction((tx) => {
    for (const r of refunds.data.filter(handsMoneyBack).reverse()) {
      recordRefundOnTab(ctx, tx, {
        memberPaymentId,
        amountCents: r.amount,
        // When Gripline learned of it, on the same clock as every other entry on the tab.
        at: ctx.now(),
        providerRefundId: r.id,
        recordedById: null,
        note: 'Refunded in the provider’s dashboard',
      });
    }
  });
}
