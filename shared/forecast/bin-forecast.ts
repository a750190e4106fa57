/**
 * One bin's forecast: weekly demand, projected on hand, safety stock, reorder point, EOQ and the
 * suggested order, and whether the bin needs a reorder alert (with the reason in words).
 */
import { HORIZON_WEEKS, meanAndStdDev, projectOnHand, type ExpectedReceipt } from './demand';
import { inverseNormal } from './inverse-normal';
import { ceilWhole, eoq, reorderPoint, safetyStock } from './inventory';
import { reorderDecision } from './reorder';

export const DEFAULT_SERVICE_LEVEL = 0.95;
const WEEKS_PER_YEAR = 52;

export type BinForecastInput = {
  onHand: number;
  leadTimeDays: number;
  /** Units per pack: orders are whole packs. */
  packSize: number;
  /** Dollars per unit; 0 when unknown (then no EOQ: the order is the shortfall). */
  unitCost: number;
  /** Planned demand per week (from spreadAssemblyDemand), or null when no assembly plans this bin. */
  weeklyPlanned: readonly number[] | null;
  /** Net consumption per past week (from weeklyDrawHistory), oldest first; [] when none. */
  history: readonly number[];
  expectedReceipts?: readonly ExpectedReceipt[];
  /** Chance of not running out during a lead time, 0.5 ≤ level < 1. */
  serviceLevel?: number;
  /** S: dollars per order placed. */
  orderCost: number;
  /** H as a yearly fraction of unit cost (0.25 = 25 % a year). */
  holdingRate: number;
  /** Weeks to forecast when there is no plan to take the length from. */
  horizonWeeks?: number;
  /** The reorder point typed on the bin: a floor under the forecast's (0 when none). */
  binReorderPoint?: number;
  /** The reorder quantity typed on the bin: a floor under the order size (0 when none). */
  binReorderQty?: number;
};

export type BinForecast = {
  /** Per week: the plan when there is one, else the history's weekly mean. */
  weeklyDemand: number[];
  demandSource: 'planned' | 'history';
  /** On hand at the end of each week (may be negative). */
  projected: number[];
  meanWeekly: number;
  sigmaWeekly: number;
  z: number;
  leadTimeWeeks: number;
  leadTimeDemand: number;
  safetyStock: number;
  safetyStockExact: number;
  reorderPoint: number;
  reorderPointExact: number;
  annualDemand: number;
  eoq: number;
  shortfall: number;
  /** Ordered and not yet received: the expected receipts summed. */
  onOrder: number;
  /** The one reorder rule's answer (shared/forecast/reorder.ts), in whole packs; 0 when not to order. */
  suggestedOrder: number;
  needsAlert: boolean;
  /** Index of the first week inside the lead time whose projected on hand is below safety stock (0 = this week). */
  weekBelowSafetyStock: number | null;
  /** Why it needs an alert, or why not; weeks in words count from 1 = this week. */
  reason: string;
};

function requireRange(name: string, value: number, ok: boolean): void {
  if (!(Number.isFinite(value) && ok)) throw new RangeError(`${name} is out of range: ${value}`);
}

/** Expected demand over a lead time of `weeks` (may be fractional); past the horizon, the horizon's mean. */
export function demandOverWeeks(weeklyDemand: readonly number[], weeks: number): number {
  const { mean } = meanAndStdDev(weeklyDemand);
  let total = 0;
  for (let w = 0; w < weeks; w++) total += (weeklyDemand[w] ?? mean) * Math.min(1, weeks - w);
  return total;
}

const units = (n: number) => String(Math.round(n * 10) / 10);
const leadTimeWords = (days: number) => (days % 7 === 0 ? `${days / 7}-week` : `${days}-day`);

export function binForecast(input: BinForecastInput): BinForecast {
  const { onHand, leadTimeDays, packSize, unitCost, weeklyPlanned, history, expectedReceipts = [] } = input;
  const { serviceLevel = DEFAULT_SERVICE_LEVEL, orderCost, holdingRate, horizonWeeks = HORIZON_WEEKS } = input;
  requireRange('onHand', onHand, true);
  requireRange('leadTimeDays', leadTimeDays, leadTimeDays >= 0);
  requireRange('unitCost', unitCost, unitCost >= 0);
  requireRange('serviceLevel', serviceLevel, serviceLevel >= 0.5 && serviceLevel < 1);
  requireRange('holdingRate', holdingRate, holdingRate >= 0);

  const { mean: meanWeekly, stdDev: sigmaWeekly } = meanAndStdDev(history);
  const demandSource = weeklyPlanned ? 'planned' : 'history';
  const weeklyDemand = weeklyPlanned ? [...weeklyPlanned] : new Array<number>(horizonWeeks).fill(meanWeekly);
  const projected = projectOnHand({ onHand, weeklyDemand, expectedReceipts });

  const z = inverseNormal(serviceLevel);
  const leadTimeWeeks = leadTimeDays / 7;
  const leadTimeDemand = demandOverWeeks(weeklyDemand, leadTimeWeeks);
  const safetyStockExact = safetyStock({ z, sigmaWeekly, leadTimeWeeks });
  const reorderPointExact = reorderPoint({ leadTimeDemand, safetyStock: safetyStockExact });
  const safety = ceilWhole(safetyStockExact);
  const reorder = ceilWhole(reorderPointExact);

  const annualDemand = meanAndStdDev(weeklyDemand).mean * WEEKS_PER_YEAR;
  const holdingCost = unitCost * holdingRate;
  const economic = holdingCost > 0 ? eoq({ annualDemand, orderCost, holdingCostPerUnitYear: holdingCost }) : 0;

  // Weeks that start before an order placed now would arrive.
  let weekBelowSafetyStock: number | null = null;
  let lowestInLeadTime = Infinity;
  for (let w = 0; w < Math.min(leadTimeWeeks, projected.length); w++) {
    const level = projected[w]!;
    lowestInLeadTime = Math.min(lowestInLeadTime, level);
    if (weekBelowSafetyStock === null && level < safety) weekBelowSafetyStock = w;
  }
  const onOrder = expectedReceipts.reduce((sum, r) => sum + r.quantity, 0);
  // A fall below safety stock before an order placed now could arrive is a reason to order, unless
  // what is already on order, arriving after that week, covers it as well as a new order would.
  const dipBelowSafety = weekBelowSafetyStock === null ? 0 : safety - lowestInLeadTime;
  const dipWeek = weekBelowSafetyStock ?? Infinity;
  const onOrderAfterDip = expectedReceipts.filter((r) => r.week > dipWeek).reduce((sum, r) => sum + r.quantity, 0);
  const dip = Math.max(0, dipBelowSafety - onOrderAfterDip);
  const decision = reorderDecision({
    onHand,
    onOrder,
    packSize,
    forecastReorderPoint: reorder,
    binReorderPoint: input.binReorderPoint ?? 0,
    binReorderQty: input.binReorderQty ?? 0,
    eoq: economic,
    projectedShortfall: dip,
  });
  const point = decision.reorderPoint;
  const { atReorderPoint } = decision;
  const shortfall = Math.max(0, atReorderPoint ? point - decision.inventoryPosition : 0, dip);
  const weekBelow = dip > 0 ? weekBelowSafetyStock : null;
  const needsAlert = decision.order;

  const lead = leadTimeWords(leadTimeDays);
  const level = onOrder > 0 ? `On hand ${units(onHand)} and ${units(onOrder)} on order are` : `On hand ${units(onHand)} is`;
  const whosePoint = point > reorder ? `the bin's own reorder point ${point}` : `the reorder point ${point}`;
  const reasons: string[] = [];
  if (atReorderPoint) reasons.push(`${level} at or below ${whosePoint}`);
  if (weekBelow !== null) {
    const when = weekBelow === 0 ? 'this week' : `in week ${weekBelow + 1}`;
    reasons.push(`Projected to fall below safety stock (${safety}) ${when}, inside the ${lead} lead time`);
  }
  const stays = `stays at or above safety stock (${safety}) through the ${lead} lead time`;
  const reason = reasons.join('; ') || (onOrder > 0 ? `${level} above ${whosePoint}; on hand ${stays}` : `${level} above ${whosePoint} and ${stays}`);

  return {
    weeklyDemand,
    demandSource,
    projected,
    meanWeekly,
    sigmaWeekly,
    z,
    leadTimeWeeks,
    leadTimeDemand,
    safetyStock: safety,
    safetyStockExact,
    reorderPoint: point,
    reorderPointExact,
    annualDemand,
    eoq: economic,
    shortfall,
    onOrder,
    suggestedOrder: decision.quantity,
    needsAlert,
    weekBelowSafetyStock,
    reason,
  };
}
