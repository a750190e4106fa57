import type { BinReorder } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';

/**
 * The one reorder computation lives with the forecast in the planning feature (it needs the planned
 * assemblies); the app hands stock this way to read it, bin id → what to order now.
 */
export type ReordersOf = (ctx: ServiceContext) => Map<number, BinReorder>;

/** A bin the computation did not see (created since): nothing to order yet. */
export const nothingToOrder = (reorderPoint: number): BinReorder => ({ low: false, toOrder: 0, onOrder: 0, reorderAt: reorderPoint, orderCostCents: 0 });
