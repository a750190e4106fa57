import { binForecast, type BinForecast } from '@shared/forecast/bin-forecast';
import {
  HORIZON_WEEKS,
  spreadAssemblyDemand,
  startOfUtcWeek,
  WEEK_MS,
  weekIndexOf,
  weekStarts,
  weeklyDrawHistory,
  type ExpectedReceipt,
  type PlannedAssembly,
} from '@shared/forecast/demand';
import { chapterDay, startOfDayNamed } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { readPlanningSettings, type PlanningSettings } from '../../settings/planning-settings';
import { assemblyBinNeeds, binIndex } from './assembly-needs';
import { allBins, drawnForAssemblies, weeklyConsumption, type BinRow } from '../stock/stock.reads';
import { assembliesIn, orderedAlerts } from './forecast.repo';

export interface BinPlan {
  bin: BinRow;
  forecast: BinForecast;
  receipts: ExpectedReceipt[];
}

export interface ForecastRun {
  now: Date;
  weeks: Date[];
  settings: PlanningSettings;
  plans: BinPlan[];
}

const ACTIVE = ['planned', 'in_progress'] as const;

/**
 * What planned and in-progress assemblies still need from each bin, spread over their dates. An
 * assembly's need goes to the bin of its spec with most on hand; what was already drawn for it from
 * any bin of that spec is taken off first.
 */
function plannedDemand(db: Executor, settings: PlanningSettings, bins: readonly BinRow[], weeks: Date[]): Map<number, number[]> {
  const index = binIndex(bins);
  const active = assembliesIn(db, [...ACTIVE]);
  const drawn = drawnForAssemblies(db, active.map((a) => a.id));
  const planned = active.map((a): PlannedAssembly<number> => {
    const byBin = new Map<number, { need: number; from: Set<number> }>();
    for (const need of assemblyBinNeeds(a, settings, index)) {
      const entry = byBin.get(need.binIds[0]!) ?? { need: 0, from: new Set<number>() };
      entry.need += need.withWaste;
      for (const id of need.binIds) entry.from.add(id);
      byBin.set(need.binIds[0]!, entry);
    }
    const remainingNeed = new Map<number, number>();
    for (const [binId, { need, from }] of byBin) {
      let taken = 0;
      for (const id of from) taken += drawn.get(`${a.id}:${id}`) ?? 0;
      if (need > taken) remainingNeed.set(binId, need - taken);
    }
    return { remainingNeed, plannedStart: a.plannedStart, plannedFinish: a.plannedFinish };
  });
  return spreadAssemblyDemand(planned, weeks);
}

/**
 * Today on the chapter's calendar, as the forecast's weeks count it. Planned and expected days are
 * stored by their names (at the UTC midnight of the name), so the weeks run on day names: week 0 is
 * the chapter week holding now, whatever the server's zone.
 */
const chapterToday = (now: Date, zone: string): Date => new Date(`${chapterDay(now, zone)}T00:00:00Z`);

/**
 * The last 26 full chapter weeks of net draws per bin, bucketed by week in the database from the
 * chapter's Monday midnight (a week with a clock change is an hour off at its edge).
 */
function drawHistory(db: Executor, today: Date, zone: string): Map<number, number[]> {
  const current = startOfUtcWeek(today);
  const from = new Date(current.getTime() - HORIZON_WEEKS * WEEK_MS);
  const midnight = (named: Date) => startOfDayNamed(chapterDay(named, 'UTC'), zone);
  const rows = weeklyConsumption(db, midnight(from), midnight(current), WEEK_MS);
  const entries = rows.map((r) => ({ binId: r.binId, at: new Date(from.getTime() + r.week * WEEK_MS), quantity: r.quantity }));
  return weeklyDrawHistory(entries, today, HORIZON_WEEKS);
}

function expectedReceipts(db: Executor, weeks: Date[]): Map<number, ExpectedReceipt[]> {
  const byBin = new Map<number, ExpectedReceipt[]>();
  for (const order of orderedAlerts(db)) {
    const list = byBin.get(order.binId) ?? [];
    list.push({ week: weekIndexOf(order.expectedAt, weeks), quantity: order.quantity });
    byBin.set(order.binId, list);
  }
  return byBin;
}

/** Every bin's forecast from four queries: bins, assemblies, draws naming them, the draw history, open orders. */
export function forecastBins(ctx: ServiceContext): ForecastRun {
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);
  const today = chapterToday(now, zone);
  const settings = readPlanningSettings(ctx.db);
  const weeks = weekStarts(today, HORIZON_WEEKS);
  const bins = allBins(ctx.db);
  const planned = plannedDemand(ctx.db, settings, bins, weeks);
  const history = drawHistory(ctx.db, today, zone);
  const receipts = expectedReceipts(ctx.db, weeks);
  const plans = bins.map((bin): BinPlan => {
    const binReceipts = receipts.get(bin.id) ?? [];
    const forecast = binForecast({
      onHand: bin.onHand,
      leadTimeDays: bin.leadTimeDays,
      packSize: bin.packSize,
      unitCost: bin.unitCostE4 / 10_000,
      weeklyPlanned: planned.get(bin.id) ?? null,
      history: history.get(bin.id) ?? [],
      expectedReceipts: binReceipts,
      serviceLevel: settings.serviceLevel,
      orderCost: settings.orderCost,
      holdingRate: settings.holdingRate,
      horizonWeeks: HORIZON_WEEKS,
      // The points typed on the bin stay floors: the forecast may raise them, never lower them.
      binReorderPoint: bin.reorderPoint,
      binReorderQty: bin.reorderQty,
    });
    return { bin, forecast, receipts: binReceipts };
  });
  return { now, weeks, settings, plans };
}
