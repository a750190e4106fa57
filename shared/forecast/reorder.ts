/**
 * The one reorder rule: whether a bin is ordered now and how much. Restock, the reorder alerts,
 * the purchase list (and its CSV), the bin page, the forecast and the digest all read this.
 *
 * Policy: an order-up-to (s, S) review on the inventory position, S = s + Q.
 * - s, the reorder point: the forecast's (demand over the lead time + safety stock), never below the
 *   point typed on the bin (the quartermaster's floor).
 * - Q: the economic order quantity, never below the reorder quantity typed on the bin.
 * - Inventory position = on hand + still on order (ordered, not yet received), so what is on its
 *   way is not ordered twice.
 * - Order when the position is at or below s (and s > 0: a bin nothing draws from and no one gave a
 *   point is not ordered because it is empty), or when the projection falls below safety stock
 *   inside the lead time (planned demand comes in lumps). Order S − position, and at least what the
 *   projection falls short, in whole packs: at least one pack.
 *
 * Why order up to S rather than a fixed Q: members draw in lumps of tens or hundreds, so a bin
 * lands below s by an "undershoot"; a fixed Q leaves the position that much lower each cycle and a
 * bin can stay at its reorder point right after an order, while ordering up to S makes up the
 * undershoot (Silver, Pyke & Peterson, Inventory Management and Production Planning and Scheduling,
 * 3rd ed. 1998, ch. 7, the (s, S) system, with S − s set from the EOQ as the usual simple choice;
 * from memory). With one-at-a-time draws the two give the same order, Q.
 */
import { ceilWhole } from './inventory';

export type ReorderInput = {
  onHand: number;
  /** Ordered and not yet received. */
  onOrder: number;
  /** Units per pack: orders are whole packs (≥ 1). */
  packSize: number;
  /** The forecast's reorder point (lead-time demand + safety stock), rounded up. */
  forecastReorderPoint: number;
  /** The point typed on the bin: a floor. */
  binReorderPoint: number;
  /** The quantity typed on the bin: a floor on Q. */
  binReorderQty: number;
  /** Economic order quantity, unrounded (0 when unknown). */
  eoq: number;
  /** Safety stock less the lowest projected level inside the lead time, when that dips below it; else 0. */
  projectedShortfall: number;
};

export type ReorderDecision = {
  reorderPoint: number;
  /** S: the level an order brings the inventory position up to. */
  orderUpTo: number;
  inventoryPosition: number;
  atReorderPoint: boolean;
  order: boolean;
  /** Whole packs; 0 when nothing is to be ordered. */
  quantity: number;
  packs: number;
};

export function reorderDecision(input: ReorderInput): ReorderDecision {
  const { onHand, onOrder, packSize, forecastReorderPoint, binReorderPoint, binReorderQty, eoq, projectedShortfall } = input;
  if (!(Number.isInteger(packSize) && packSize >= 1)) throw new RangeError(`packSize must be a whole number ≥ 1, got ${packSize}`);
  const reorderPoint = Math.max(forecastReorderPoint, binReorderPoint, 0);
  const inventoryPosition = onHand + Math.max(0, onOrder);
  const orderUpTo = reorderPoint + ceilWhole(Math.max(eoq, binReorderQty, 0));
  const atReorderPoint = reorderPoint > 0 && inventoryPosition <= reorderPoint;
  const order = atReorderPoint || projectedShortfall > 0;
  const need = order ? Math.max(orderUpTo - inventoryPosition, projectedShortfall, 1) : 0;
  const packs = order ? ceilWhole(need / packSize) : 0;
  return { reorderPoint, orderUpTo, inventoryPosition, atReorderPoint, order, quantity: packs * packSize, packs };
}
