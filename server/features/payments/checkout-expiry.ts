import Stripe from 'stripe';
import type { ServiceContext } from '../../context';
import type { Logger } from '../../lib/logger';
import type { PaymentsSetup } from '../../payments/payments-client';
import { closeOnlinePayment, onlinePaymentBySession, openOnlinePaymentsOf } from './payments.repo';
import { CHECKOUT_UNREACHABLE, providerCall } from './provider-call';

/**
 * Before a member opens a new checkout, their earlier ones still open are expired at the provider, so
 * a forgotten page in another tab cannot be paid as well. One the provider will not expire (it was
 * just paid, and its completion is on the way) stays open for the webhook to settle.
 */
export async function expireEarlierCheckouts(ctx: ServiceContext, setup: PaymentsSetup, userId: number): Promise<void> {
  for (const row of openOnlinePaymentsOf(ctx.db, userId)) {
    const expired = await providerCall(
      () =>
        setup.provider.checkout.sessions.expire(row.sessionId).catch((err: unknown) => {
          if (err instanceof Stripe.errors.StripeInvalidRequestError) return null;
          throw err;
        }),
      CHECKOUT_UNREACHABLE,
    );
    if (!expired) continue;
    closeOnlinePayment(ctx.db, row.id, { state: 'expired', updatedAt: ctx.now() });
  }
}

/** The provider says a checkout expired (Gripline expired it, or it lapsed unpaid): it is closed for good. */
export function recordExpiredCheckout(ctx: ServiceContext, logger: Logger, eventId: string, session: Stripe.Checkout.Session): void {
  const row = onlinePaymentBySession(ctx.db, session.id);
  if (!row) {
    logger.warn({ sessionId: session.id, eventId }, 'an expired checkout that Gripline did not open was ignored');
    return;
  }
  closeOnlinePayment(ctx.db, row.id, { state: 'expired', eventId, updatedAt: ctx.now() });
}
