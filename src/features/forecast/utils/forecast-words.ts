import type { BinForecastDto } from '@shared/schemas/forecast';
import { formatCount, formatDay, formatPercent, formatQuantity, formatTenth, leadTimeWords, packWords } from './format';

export const DEMAND_SOURCE_WORDS: Record<BinForecastDto['demandSource'], string> = {
  planned: 'from planned assemblies',
  history: 'from the last 26 weeks of draws',
};

export const statusWords = (f: BinForecastDto): string => (f.needsAlert ? 'Needs ordering' : 'No order needed');

const sum = (xs: readonly number[]) => xs.reduce((s, x) => s + x, 0);

/** When the projection first goes below zero, or its lowest point. */
function lowestWords(f: BinForecastDto): string {
  const { projected, weeks, bin } = f;
  const out = projected.findIndex((p) => p < 0);
  if (out >= 0) return `Projected to run out in the week of ${formatDay(weeks[out]!)} unless more comes in.`;
  let low = 0;
  projected.forEach((p, i) => {
    if (p < projected[low]!) low = i;
  });
  if (projected.length === 0) return '';
  return `Lowest projected on hand: ${formatQuantity(Math.floor(projected[low]!), bin.unit)}, in the week of ${formatDay(weeks[low]!)}.`;
}

/**
 * The chart in sentences, one figure each: where demand comes from, the lead time, the levels the
 * bin is judged against and the order suggested.
 */
export function forecastSentences(f: BinForecastDto, serviceLevel: number): string[] {
  const { bin, weeks } = f;
  const u = bin.unit;
  const total = sum(f.weeklyDemand);
  const sentences = [
    `Demand ${DEMAND_SOURCE_WORDS[f.demandSource]}: ${formatQuantity(Math.ceil(total), u)} over ${weeks.length} weeks, about ${formatTenth(
      f.weeklyDemand.length ? total / f.weeklyDemand.length : 0,
    )} a week.`,
    `Lead time ${leadTimeWords(bin.leadTimeDays)}: about ${formatQuantity(Math.ceil(f.leadTimeDemand), u)} used while an order is on its way.`,
    `Safety stock ${formatQuantity(f.safetyStock, u)}: z = ${f.z.toFixed(2)} for a ${formatPercent(serviceLevel)} service level, with weekly draws varying by ${formatTenth(
      f.sigmaWeekly,
    )} (σ).`,
    `Reorder point ${formatQuantity(f.reorderPoint, u)}: lead-time demand plus safety stock.`,
    f.suggestedOrder > 0
      ? `Suggested order ${formatQuantity(f.suggestedOrder, u)}${packWords(f.suggestedOrder, bin.packSize) ? ` (${packWords(f.suggestedOrder, bin.packSize)})` : ''}; the economic order quantity is ${formatCount(Math.round(f.eoq))}.`
      : `No order suggested; the economic order quantity is ${formatCount(Math.round(f.eoq))}.`,
  ];
  for (const r of f.expectedReceipts) {
    const week = weeks[r.week];
    if (week) sentences.push(`On order: ${formatQuantity(r.quantity, u)} expected in the week of ${formatDay(week)}.`);
  }
  const lowest = lowestWords(f);
  if (lowest) sentences.push(lowest);
  return sentences;
}

/** Receipts per week index, for the table and the chart. */
export function receiptsByWeek(f: BinForecastDto): number[] {
  const byWeek = new Array<number>(f.weeks.length).fill(0);
  for (const r of f.expectedReceipts) if (r.week >= 0 && r.week < byWeek.length) byWeek[r.week]! += r.quantity;
  return byWeek;
}
