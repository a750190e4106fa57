import { publish, type Reaction } from '../../events/domain-events';
import { recordOnlinePayment, recordRefund } from './money.service';

/** A checkout paid online comes off the member's tab; stock tells which payment on the tab it became. */
export const putOnlinePaymentOnTab: Reaction<'payment.received'> = (ctx, e) => {
  const memberPaymentId = recordOnlinePayment(ctx.db, e.userId, e.amountCents, e.at, e.note);
  publish(ctx, { type: 'tab.online_payment_recorded', onlinePaymentId: e.onlinePaymentId, memberPaymentId, userId: e.userId, at: e.at });
};

/** Money handed back on a payment puts the member's balance back up, once per provider refund. */
export const putRefundOnTab: Reaction<'payment.refunded'> = (ctx, e) => {
  recordRefund(ctx.db, {
    memberPaymentId: e.memberPaymentId,
    amountCents: e.amountCents,
    at: e.at,
    providerRefundId: e.providerRefundId,
    recordedById: e.recordedById,
    note: e.note,
  });
};
