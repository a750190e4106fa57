import type { Reaction } from '../../events/domain-events';
import { linkMemberPayment } from './payments.repo';

/** A paid checkout keeps the payment on the tab it became: a refund names it, and the provider's refunds find it. */
export const linkCheckoutToTabPayment: Reaction<'tab.online_payment_recorded'> = (ctx, e) => linkMemberPayment(ctx.db, e.onlinePaymentId, e.memberPaymentId);
