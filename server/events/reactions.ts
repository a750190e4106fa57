import { countReceiptAgainstAlert } from '../features/planning/planning.reactions';
import { endHoldsOfDeactivated } from '../features/tools/tools.reactions';
import { linkCheckoutToTabPayment } from '../features/payments/payments.reactions';
import { putOnlinePaymentOnTab, putRefundOnTab } from '../features/stock/stock.reactions';
import { appReactionsInstalled, installAppReactions, type Reactions } from './domain-events';

/**
 * Who reacts to which domain event, in order: the one place that composes the features (they never
 * import each other). Each feature's reactions live in its `<feature>.reactions.ts`.
 */
export const REACTIONS: Reactions = {
  'stock.received': [countReceiptAgainstAlert],
  'person.deactivated': [endHoldsOfDeactivated],
  'payment.received': [putOnlinePaymentOnTab],
  'tab.online_payment_recorded': [linkCheckoutToTabPayment],
  'payment.refunded': [putRefundOnTab],
};

/** Installs the reactions for this process; every entry point that writes calls it (a second call does nothing). */
export function installReactions(): void {
  if (!appReactionsInstalled()) installAppReactions(REACTIONS);
}
