import type { BinReorder } from '@shared/schemas/bins';

/** A bin the one reorder computation (planning's `binReorders`) did not see, created since: nothing to order yet. */
export const nothingToOrder = (reorderPoint: number): BinReorder => ({ low: false, toOrder: 0, onOrder: 0, reorderAt: reorderPoint, orderCostCents: 0 });
