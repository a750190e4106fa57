import type { CheckoutStatus } from '@shared/schemas/payments';
import type { Executor } from '../../db/client';
import { HttpError } from '../../lib/http-error';
import { onlinePaymentBySession } from './payments.repo';

/**
 * Where a member's checkout stands, for My tab while the provider's webhook is on its way. Another
 * member's checkout is not found, exactly as one that does not exist: its id tells nobody anything.
 */
export function readCheckoutStatus(db: Executor, userId: number, sessionId: string): CheckoutStatus {
  const row = onlinePaymentBySession(db, sessionId);
  if (!row || row.userId !== userId) throw new HttpError(404, 'CHECKOUT_NOT_FOUND', 'No checkout of yours has that id.');
  return { state: row.state, amountCents: row.amountCents, currency: row.currency as CheckoutStatus['currency'] };
}
