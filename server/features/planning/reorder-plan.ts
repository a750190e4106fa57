import type { BinReorder } from '@shared/schemas/bins';
import { valueCents } from '@shared/stock/money';
import { DAY_MS } from '@shared/time/durations';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import { recentDismissals } from './alerts.repo';
import { forecastBins, type BinPlan, type ForecastRun } from './forecast.service';

/** A dismissed alert keeps its bin quiet this long, unless on hand falls below what it was raised at. */
export const DISMISSAL_QUIET_MS = 14 * DAY_MS;

export interface PlannedOrder extends BinReorder {
  plan: BinPlan;
  packs: number;
  /** The quartermaster dismissed the bin's alert lately and things have not got worse: nothing is ordered. */
  quiet: boolean;
}

export interface ReorderPlan {
  run: ForecastRun;
  /** Every bin, by id. */
  orders: Map<number, PlannedOrder>;
}

/** Bins whose dismissed alert still holds: on hand at or above the level the alert was raised at. */
function quietBins(db: Executor, run: ForecastRun): Set<number> {
  const dismissed = recentDismissals(db, new Date(run.now.getTime() - DISMISSAL_QUIET_MS));
  return new Set(run.plans.filter(({ bin }) => bin.onHand >= (dismissed.get(bin.id) ?? Infinity)).map(({ bin }) => bin.id));
}

/**
 * What to order now, per bin: the forecast's one reorder rule (shared/forecast/reorder.ts) with a
 * recent dismissal respected. Restock, the alerts, the purchase list, the bin page and the digest
 * all read this, so a bin shows the same quantity wherever it appears.
 */
export function reorderPlan(ctx: ServiceContext): ReorderPlan {
  const run = forecastBins(ctx);
  const quiet = quietBins(ctx.db, run);
  const orders = new Map<number, PlannedOrder>();
  for (const plan of run.plans) {
    const { bin, forecast: f } = plan;
    const isQuiet = quiet.has(bin.id);
    const toOrder = isQuiet ? 0 : f.suggestedOrder;
    orders.set(bin.id, {
      plan,
      low: f.needsAlert,
      toOrder,
      packs: toOrder / bin.packSize,
      onOrder: f.onOrder,
      reorderAt: f.reorderPoint,
      orderCostCents: valueCents(toOrder, bin.unitCostE4),
      quiet: isQuiet,
    });
  }
  return { run, orders };
}

