import type { Executor } from '../../db/client';
import { refundByProviderId } from './money.repo';

/**
 * What other features may read of stock's tables: read models only, never rows to write back.
 * Another feature imports this file and nothing else of stock.
 */

// ---- for payments: the tab a checkout settles, its payments and their refunds ----

export { listTabPayments, tabBalanceCents, tabPayment } from './money.service';

/** A refund recorded on a tab's payment, by the provider's refund id. */
export interface TabRefund {
  id: number;
  memberPaymentId: number;
  amountCents: number;
  at: Date;
  providerRefundId: string | null;
  /** The lead who made it; null when it came from the provider's dashboard and nobody has claimed it. */
  recordedById: number | null;
}

/** The refund recorded under a provider's refund id; undefined until it is. */
export function tabRefund(db: Executor, providerRefundId: string): TabRefund | undefined {
  const r = refundByProviderId(db, providerRefundId);
  return r && { id: r.id, memberPaymentId: r.memberPaymentId, amountCents: r.amountCents, at: r.at, providerRefundId: r.providerRefundId, recordedById: r.recordedById };
}
