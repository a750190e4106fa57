import { countReceiptAgainstAlert } from '../features/planning/planning.reactions';
import { endHoldsOfDeactivated } from '../features/tools/tools.reactions';
import { appReactionsInstalled, installAppReactions, type Reactions } from './domain-events';

/**
 * Who reacts to which domain event, in order: the one place that composes the features (they never
 * import each other). Each feature's reactions live in its `<feature>.reactions.ts`.
 */
export const REACTIONS: Reactions = {
  'stock.received': [countReceiptAgainstAlert],
  'person.deactivated': [endHoldsOfDeactivated],
  'payment.received': [],
  'tab.online_payment_recorded': [],
  'payment.refunded': [],
};

/** Installs the reactions for this process; every entry point that writes calls it (a second call does nothing). */
export function installReactions(): void {
  if (!appReactionsInstalled()) installAppReactions(REACTIONS);
}
