import { chapterDay } from '@shared/time/chapter-time';
import type { BinForecastDto, ForecastList } from '@shared/schemas/forecast';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { binBrief } from './bin-brief';
import { reorderPlan, type PlannedOrder } from './reorder-plan';

const rounder = (places: number) => {
  const factor = 10 ** places;
  return (x: number) => Math.round(x * factor) / factor + 0;
};
const round1 = rounder(1);
const round2 = rounder(2);
const round3 = rounder(3);
const round4 = rounder(4);

function toForecastDto({ plan: { bin, forecast: f, receipts }, toOrder, quiet }: PlannedOrder, weeks: Date[]): BinForecastDto {
  return {
    bin: binBrief(bin),
    weeks: weeks.map((w) => chapterDay(w, 'UTC')),
    weeklyDemand: f.weeklyDemand.map(round2),
    demandSource: f.demandSource,
    projected: f.projected.map(round2),
    // As the projection counts them: an overdue order in this week, orders after the horizon left out.
    expectedReceipts: receipts.filter((r) => r.week < weeks.length).map((r) => ({ week: Math.max(0, r.week), quantity: r.quantity })),
    sigmaWeekly: round3(f.sigmaWeekly),
    z: round4(f.z),
    leadTimeWeeks: round3(f.leadTimeWeeks),
    leadTimeDemand: round2(f.leadTimeDemand),
    safetyStock: f.safetyStock,
    reorderPoint: f.reorderPoint,
    eoq: round1(f.eoq),
    // What Restock and the purchase list order: nothing while a dismissal keeps the bin quiet.
    suggestedOrder: toOrder,
    needsAlert: f.needsAlert,
    reason: quiet ? `${f.reason}; its reorder alert was dismissed, so nothing is ordered for now` : f.reason,
  };
}

/** GET /api/forecast: every bin, or the listed ones (an unknown code is a 404 that names it). */
export function forecastList(ctx: ServiceContext, codes?: string[]): ForecastList {
  const { run, orders } = reorderPlan(ctx);
  let plans = [...orders.values()];
  if (codes) {
    const wanted = new Set(codes);
    plans = plans.filter((p) => wanted.has(p.plan.bin.code));
    const found = new Set(plans.map((p) => p.plan.bin.code));
    const missing = [...wanted].filter((c) => !found.has(c));
    if (missing.length === 1) throw new HttpError(404, 'BIN_NOT_FOUND', `No bin has the code ${missing[0]}. Check the label, or type the code.`);
    if (missing.length > 1) throw new HttpError(404, 'BIN_NOT_FOUND', `No bins have the codes ${missing.join(', ')}. Check the codes and try again.`);
  }
  return {
    data: plans.map((p) => toForecastDto(p, run.weeks)),
    meta: { generatedAt: run.now.toISOString(), serviceLevel: run.settings.serviceLevel, horizonWeeks: run.weeks.length },
  };
}
