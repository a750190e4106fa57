import type { Reaction } from '../../events/domain-events';
import { receiptOnBin } from './alert-state';

/** A delivery into a bin counts against its active reorder alert: it closes it, or advances an order on its way. */
export const countReceiptAgainstAlert: Reaction<'stock.received'> = (ctx, e) =>
  receiptOnBin(ctx.db, e.binId, { event: 'receive', at: e.at, quantity: e.quantity, movementId: e.movementId });
