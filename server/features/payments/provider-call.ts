import Stripe from 'stripe';
import { HttpError } from '../../lib/http-error';

/**
 * One call to the payment provider through its SDK. The provider down or unreachable is the
 * chapter's problem to retry, not a fault in Gripline: 502 with `unreachable`. A request the
 * provider refuses (say, more than is left to refund) is 409 with the provider's own reason.
 */
export async function providerCall<T>(call: () => Promise<T>, unreachable: string): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof Stripe.errors.StripeConnectionError || err instanceof Stripe.errors.StripeAPIError) {
      throw new HttpError(502, 'PROVIDER_UNAVAILABLE', unreachable);
    }
    if (err instanceof Stripe.errors.StripeInvalidRequestError) {
      throw new HttpError(409, 'PROVIDER_REFUSED', `The payment provider refused: ${err.message}`);
    }
    throw err;
  }
}

/** What a member is told when a checkout cannot be opened (or an earlier one closed) at the provider. */
export const CHECKOUT_UNREACHABLE = 'The payment provider could not be reached. Try again in a minute, or pay the quartermaster in cash.';
