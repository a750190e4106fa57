import type Stripe from 'stripe';
import type { PaymentMethod } from '@shared/schemas/payment-methods';
import { MIN_ONLINE_PAYMENT_CENTS, type CheckoutBody, type CheckoutResponse } from '@shared/schemas/payments';
import { centsWords } from '@shared/stock/money';
import { findUserById } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { publish } from '../../events/domain-events';
import { HttpError } from '../../lib/http-error';
import type { Logger } from '../../lib/logger';
import { paymentReceiptMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import type { PaymentsSetup } from '../../payments/payments-client';
import { readPaymentSettings } from '../../settings/payment-settings';
import { expireEarlierCheckouts, recordExpiredCheckout } from './checkout-expiry';
import { CHECKOUT_UNREACHABLE, providerCall } from './provider-call';
import { recordChargeRefunds } from './refunds.service';
import { refuseCheckout } from './refused-checkouts';
import { closeOnlinePayment, insertOnlinePayment, onlinePaymentBySession } from './payments.repo';
import { tabBalanceCents } from '../stock/stock.reads';

/** Which payments to list: from and before moments, and cash or online. */
export interface PaymentFilter {
  from?: Date;
  to?: Date;
  method?: PaymentMethod;
}

/** My tab, where a receipt points. */
export const myTabPage = (ctx: ServiceContext) => `${ctx.publicUrl}/tab`;
/** The page a member comes back to from the hosted checkout. */
const myTabUrl = (ctx: ServiceContext, outcome: 'paid' | 'cancelled') => `${myTabPage(ctx)}?payment=${outcome}`;
/** The provider puts the session's id in place of this placeholder when it sends the payer back. */
const CHECKOUT_SESSION_ID = '{CHECKOUT_SESSION_ID}';

/** Ties a checkout to the member whose tab it settles. */
export const memberReference = (userId: number) => `member-${userId}`;

function amountToPay(balanceCents: number, asked: number | undefined): number {
  if (balanceCents <= 0) throw new HttpError(400, 'NOTHING_OWED', 'Your tab is settled: there is nothing to pay.');
  if (balanceCents < MIN_ONLINE_PAYMENT_CENTS) {
    throw new HttpError(400, 'BELOW_MINIMUM', `Your tab is ${centsWords(balanceCents)}, under the ${centsWords(MIN_ONLINE_PAYMENT_CENTS)} online minimum. Pay it in cash to the quartermaster.`);
  }
  const amount = asked ?? balanceCents;
  if (amount > balanceCents) {
    throw new HttpError(400, 'ABOVE_BALANCE', `You owe ${centsWords(balanceCents)}; pay that much or less.`, [{ path: 'amountCents', message: `At most ${centsWords(balanceCents)}.` }]);
  }
  return amount;
}

const openHostedCheckout = (setup: PaymentsSetup, params: Stripe.Checkout.SessionCreateParams): Promise<Stripe.Checkout.Session> =>
  providerCall(() => setup.provider.checkout.sessions.create(params), CHECKOUT_UNREACHABLE);

function offeredCurrency(ctx: ServiceContext) {
  const { offered, currency } = readPaymentSettings(ctx.db);
  if (!offered) throw new HttpError(409, 'ONLINE_PAYMENT_OFF', 'The chapter does not take payments online. Pay your tab in cash to the quartermaster.');
  return currency;
}

/**
 * Opens a hosted checkout for the signed-in member's own tab (the whole balance unless a smaller
 * amount is asked) and returns the provider's page to send them to. Their earlier checkouts still open
 * are expired first, so only one can be paid.
 */
export async function startCheckout(ctx: ServiceContext, setup: PaymentsSetup, member: UserRow, body: CheckoutBody): Promise<CheckoutResponse> {
  const currency = offeredCurrency(ctx);
  const amountCents = amountToPay(tabBalanceCents(ctx.db, member.id), body.amountCents);
  await expireEarlierCheckouts(ctx, setup, member.id);
  const session = await openHostedCheckout(setup, {
    mode: 'payment',
    line_items: [{ quantity: 1, price_data: { currency, unit_amount: amountCents, product_data: { name: 'Consumables tab' } } }],
    customer_email: member.email,
    client_reference_id: memberReference(member.id),
    metadata: { userId: String(member.id) },
    success_url: `${myTabUrl(ctx, 'paid')}&checkout=${CHECKOUT_SESSION_ID}`,
    cancel_url: myTabUrl(ctx, 'cancelled'),
  });
  if (!session.url) throw new Error(`the provider returned checkout ${session.id} without a page`);
  const now = ctx.now();
  insertOnlinePayment(ctx.db, { sessionId: session.id, userId: member.id, amountCents, currency, createdAt: now, updatedAt: now });
  return { url: session.url };
}

/** Checks the provider's signature on the raw body; a bad or stale one is 400 and nothing changes. */
function verifiedEvent(setup: PaymentsSetup, rawBody: Buffer, signature: string | string[] | undefined): Stripe.Event {
  try {
    return setup.provider.webhooks.constructEvent(rawBody, signature ?? '', setup.webhookSecret);
  } catch {
    throw new HttpError(400, 'BAD_SIGNATURE', 'The webhook signature is missing, wrong or too old.');
  }
}

/**
 * Records a completed checkout once, with its receipt in the same transaction: `payment.received`
 * puts it on the member's tab (stock), which names the tab's payment back (`tab.online_payment_recorded`).
 * A checkout already closed (the same event again, or a second completion) changes nothing; an
 * amount or currency that differs from the checkout Gripline opened is refused, kept and reported
 * to the leads (refuseCheckout).
 */
function settleCheckout(ctx: ServiceContext, logger: Logger, eventId: string, session: Stripe.Checkout.Session): void {
  ctx.db.transaction((tx) => {
    const row = onlinePaymentBySession(tx, session.id);
    if (!row) {
      logger.warn({ sessionId: session.id, eventId }, 'a completed checkout that Gripline did not open was ignored');
      return;
    }
    if (row.state === 'expired') {
      logger.warn({ sessionId: session.id, eventId, userId: row.userId }, 'a completion for an expired checkout was not recorded');
      return;
    }
    if (row.state !== 'open' || session.payment_status !== 'paid') return;
    const now = ctx.now();
    if (session.amount_total !== row.amountCents || session.currency !== row.currency) {
      refuseCheckout(ctx, tx, logger, row, eventId, session, now);
      return;
    }
    const member = findUserById(tx, row.userId)!;
    const paymentIntentId = typeof session.payment_intent === 'string' ? session.payment_intent : (session.payment_intent?.id ?? null);
    if (!closeOnlinePayment(tx, row.id, { state: 'paid', eventId, paymentIntentId, updatedAt: now })) throw new Error(`checkout ${row.id} closed twice`);
    publish(ctx, { type: 'payment.received', onlinePaymentId: row.id, userId: member.id, amountCents: row.amountCents, at: now, note: 'Paid online' });
    queueMail(tx, paymentReceiptMail(member.email, member.name, row.amountCents, tabBalanceCents(tx, member.id), myTabPage(ctx)), now);
  });
}

/**
 * The provider's webhook: verified first, then a completed checkout is settled, an expired one
 * closed and refunds on a charge recorded; other events are acknowledged.
 */
export async function receiveProviderEvent(ctx: ServiceContext, setup: PaymentsSetup, logger: Logger, rawBody: Buffer, signature: string | string[] | undefined): Promise<void> {
  const event = verifiedEvent(setup, rawBody, signature);
  if (event.type === 'checkout.session.completed') settleCheckout(ctx, logger, event.id, event.data.object);
  if (event.type === 'checkout.session.expired') recordExpiredCheckout(ctx, logger, event.id, event.data.object);
  if (event.type === 'charge.refunded') await recordChargeRefunds(ctx, setup, logger, event.data.object);
}
