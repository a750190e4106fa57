/** The textbook inventory formulas behind a bin's reorder point and order size (the rule that uses them: reorder.ts). */

function requireNonNegative(name: string, value: number): void {
  if (!(Number.isFinite(value) && value >= 0)) throw new RangeError(`${name} must be a finite number ≥ 0, got ${value}`);
}

/** Rounding up that ignores floating-point dust (60.000000000000007 stays 60), and never gives −0. */
export function ceilWhole(value: number): number {
  return Math.ceil(value - 1e-9) + 0;
}

export type EoqInput = { annualDemand: number; orderCost: number; holdingCostPerUnitYear: number };

/** Economic order quantity Q* = √(2DS/H) (Harris 1913; Wilson 1934). Unrounded units. */
export function eoq({ annualDemand, orderCost, holdingCostPerUnitYear }: EoqInput): number {
  requireNonNegative('annualDemand', annualDemand);
  requireNonNegative('orderCost', orderCost);
  if (!(Number.isFinite(holdingCostPerUnitYear) && holdingCostPerUnitYear > 0)) {
    throw new RangeError(`holdingCostPerUnitYear must be > 0, got ${holdingCostPerUnitYear}`);
  }
  return Math.sqrt((2 * annualDemand * orderCost) / holdingCostPerUnitYear);
}

export type SafetyStockInput = { z: number; sigmaWeekly: number; leadTimeWeeks: number };

/** z·σ_d·√L: weekly demand varies, the lead time does not, so σ over the lead time is σ_d·√L. Unrounded units. */
export function safetyStock({ z, sigmaWeekly, leadTimeWeeks }: SafetyStockInput): number {
  if (!Number.isFinite(z)) throw new RangeError(`z must be finite, got ${z}`);
  requireNonNegative('sigmaWeekly', sigmaWeekly);
  requireNonNegative('leadTimeWeeks', leadTimeWeeks);
  return z * sigmaWeekly * Math.sqrt(leadTimeWeeks);
}

export type ReorderPointInput = { leadTimeDemand: number; safetyStock: number };

/** Reorder point = expected demand over the lead time + safety stock. Unrounded units. */
export function reorderPoint({ leadTimeDemand, safetyStock }: ReorderPointInput): number {
  requireNonNegative('leadTimeDemand', leadTimeDemand);
  if (!Number.isFinite(safetyStock)) throw new RangeError(`safetyStock must be finite, got ${safetyStock}`);
  return leadTimeDemand + safetyStock;
}
