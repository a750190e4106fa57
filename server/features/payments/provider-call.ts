import Stripe from 'stripe';
import { HttpError } from '../../lib/http-error';

/** The provider down or unreachable is the chapter's problem to retry, not a fault in Gripline. */
export async function atProvider<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof Stripe.errors.StripeConnectionError || err instanceof Stripe.errors.StripeAPIError) {
      throw new HttpError(502, 'PROVIDER_UNAVAILABLE', 'The payment provider could not be reached. Try again in a minute, or pay the quartermaster in cash.');
    }
    throw err;
  }
}
