import { DAY_MS } from '../time/durations';

/**
 * Weekly demand per bin: planned assemblies spread over their dates, draw history by week, and the
 * projected on hand. Weeks start on a Monday and run on day names (planned days are stored at the
 * UTC midnight of their name; the forecast service passes the chapter's today by name, so these are
 * the chapter's weeks); week 0 is the week that holds `now`, so the chart's weeks line up with the
 * ones people plan in, and a week's demand is whole even when `now` falls mid-week.
 */

export const HORIZON_WEEKS = 26;
export const WEEK_MS = 7 * DAY_MS;

/** Monday 00:00 UTC on or before `at`. */
export function startOfUtcWeek(at: Date): Date {
  const sinceMonday = (at.getUTCDay() + 6) % 7;
  return new Date(Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate() - sinceMonday));
}

/** The starts of the forecast's weeks: week 0 is the UTC week holding `now`, then one a week. */
export function weekStarts(now: Date, weeks: number = HORIZON_WEEKS): Date[] {
  if (!(Number.isInteger(weeks) && weeks >= 0)) throw new RangeError(`weeks must be a whole number ≥ 0, got ${weeks}`);
  const first = startOfUtcWeek(now).getTime();
  return Array.from({ length: weeks }, (_, i) => new Date(first + i * WEEK_MS));
}

/** Which week of `weeks` (from weekStarts) holds `at`: negative before the horizon, ≥ weeks.length after it. */
export function weekIndexOf(at: Date, weeks: readonly Date[]): number {
  const first = weeks[0];
  if (!first) throw new RangeError('weeks must not be empty');
  return Math.floor((at.getTime() - first.getTime()) / WEEK_MS);
}

/** A planned or in-progress assembly: what it still needs from each bin and its planned dates. */
export type PlannedAssembly<K> = {
  remainingNeed: ReadonlyMap<K, number>;
  plannedStart: Date | null;
  plannedFinish: Date | null;
};

/** First and last week (indices relative to the horizon, last may lie beyond it) an assembly's need is spread over. */
function spreadWindow(assembly: PlannedAssembly<unknown>, weeks: readonly Date[]): { first: number; last: number } {
  const { plannedStart, plannedFinish } = assembly;
  if (!plannedFinish) {
    // Without a finish there is nothing to spread over: all of it in the start's week, or now.
    const at = plannedStart ? Math.max(0, weekIndexOf(plannedStart, weeks)) : 0;
    return { first: at, last: at };
  }
  const last = weekIndexOf(plannedFinish, weeks);
  if (last < 0) return { first: 0, last: 0 }; // overdue: still needed, so needed now
  // A window that already started spreads only over its remaining weeks.
  const first = plannedStart ? Math.max(0, weekIndexOf(plannedStart, weeks)) : 0;
  return { first, last: Math.max(first, last) };
}

/**
 * Weekly planned demand per bin. Each assembly's remaining need is spread evenly over every week its
 * window touches from now on, including weeks past the horizon, and only the weeks inside the
 * horizon are kept: so an assembly finishing in 40 weeks puts 26/40 of its need in this forecast.
 * No finish date, or a finish already past: the whole need falls in week 0 (in the start's week when
 * only a start is known). A finish before the start counts as the start's week. Pass only planned
 * and in-progress assemblies. Bins that no assembly needs are absent from the result.
 */
export function spreadAssemblyDemand<K>(assemblies: Iterable<PlannedAssembly<K>>, weeks: readonly Date[]): Map<K, number[]> {
  const demand = new Map<K, number[]>();
  if (weeks.length === 0) return demand;
  for (const assembly of assemblies) {
    const { first, last } = spreadWindow(assembly, weeks);
    if (first >= weeks.length) continue;
    const span = last - first + 1;
    const end = Math.min(last, weeks.length - 1);
    for (const [binId, need] of assembly.remainingNeed) {
      if (!(need > 0)) continue;
      let series = demand.get(binId);
      if (!series) demand.set(binId, (series = new Array<number>(weeks.length).fill(0)));
      const perWeek = need / span;
      for (let w = first; w <= end; w++) series[w]! += perWeek;
    }
  }
  return demand;
}

/** A ledger entry as consumption: draws positive, returns of unused stock negative. */
export type DrawEntry<K> = { binId: K; at: Date; quantity: number };

/**
 * Consumption per bin over the last `weeks` full weeks before the current one, oldest first, each
 * week netted (draws − returns) and never below 0. Bins with no entries in the window are absent.
 */
export function weeklyDrawHistory<K>(draws: Iterable<DrawEntry<K>>, now: Date, weeks: number = HORIZON_WEEKS): Map<K, number[]> {
  if (!(Number.isInteger(weeks) && weeks >= 0)) throw new RangeError(`weeks must be a whole number ≥ 0, got ${weeks}`);
  const currentWeek = startOfUtcWeek(now).getTime();
  const history = new Map<K, number[]>();
  for (const { binId, at, quantity } of draws) {
    const index = weeks + Math.floor((at.getTime() - currentWeek) / WEEK_MS);
    if (index < 0 || index >= weeks) continue;
    let series = history.get(binId);
    if (!series) history.set(binId, (series = new Array<number>(weeks).fill(0)));
    series[index]! += quantity;
  }
  for (const series of history.values()) {
    for (let i = 0; i < series.length; i++) series[i] = Math.max(0, series[i]!);
  }
  return history;
}

/** Mean and sample standard deviation (n − 1); the deviation is 0 for fewer than two points. */
export function meanAndStdDev(series: readonly number[]): { mean: number; stdDev: number } {
  const n = series.length;
  if (n === 0) return { mean: 0, stdDev: 0 };
  let sum = 0;
  for (const x of series) sum += x;
  const mean = sum / n;
  if (n < 2) return { mean, stdDev: 0 };
  let squares = 0;
  for (const x of series) squares += (x - mean) * (x - mean);
  return { mean, stdDev: Math.sqrt(squares / (n - 1)) };
}

/** An open order: `week` as from weekIndexOf of its expected date. */
export type ExpectedReceipt = { week: number; quantity: number };

export type ProjectOnHandInput = {
  onHand: number;
  weeklyDemand: readonly number[];
  expectedReceipts?: readonly ExpectedReceipt[];
};

/**
 * On hand at the end of each week: on hand − demand so far + receipts due by then. It goes negative
 * when demand outruns stock: that is the warning the chart shows. An overdue order (week < 0) is
 * counted in week 0; orders due after the horizon are left out.
 */
export function projectOnHand({ onHand, weeklyDemand, expectedReceipts = [] }: ProjectOnHandInput): number[] {
  const receipts = new Array<number>(weeklyDemand.length).fill(0);
  for (const { week, quantity } of expectedReceipts) {
    const w = Math.max(0, Math.floor(week));
    if (w < receipts.length) receipts[w]! += quantity;
  }
  const projected = new Array<number>(weeklyDemand.length);
  let level = onHand;
  for (let w = 0; w < weeklyDemand.length; w++) {
    level += receipts[w]! - weeklyDemand[w]!;
    projected[w] = level;
  }
  return projected;
}
