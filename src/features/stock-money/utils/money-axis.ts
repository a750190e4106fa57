import type { SpendMonth } from '@shared/schemas/stock-money';
import type { BinKind } from '@shared/stock/kinds';

export interface MoneyAxis {
  /** Dollars at the bottom and top of the plot. */
  domain: [number, number];
  /** Dollars where the axis has a label, lowest first. */
  ticks: number[];
}

/** About four steps of 1, 2 or 5 times a power of ten: 105 → 200, 80 → 100, 0.3 → 0.5. */
function niceStep(span: number): number {
  const raw = span / 4;
  const power = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((f) => f * power).find((s) => s >= raw)!;
}

/**
 * The dollar axis of stacked monthly bars: from the lowest stack below zero (or $0) to a whole
 * step above the highest. A step below zero is labelled only when the bars under zero reach a
 * quarter of a step: 59 cents of returns in one month show as what they are, not as an axis
 * running to −$100 with nothing visible beneath $0.
 */
export function moneyAxis(months: SpendMonth[], kinds: BinKind[]): MoneyAxis {
  const stacks = months.map((m) => kinds.map((k) => m.byKind[k] / 100));
  const high = Math.max(0, ...stacks.map((s) => s.filter((v) => v > 0).reduce((a, v) => a + v, 0)));
  const low = Math.min(0, ...stacks.map((s) => s.filter((v) => v < 0).reduce((a, v) => a + v, 0)));
  if (high === 0 && low === 0) return { domain: [0, 1], ticks: [0, 1] };
  const step = niceStep(high - low);
  const top = Math.ceil(high / step) * step;
  const bottom = -low >= step / 4 ? Math.floor(low / step) * step : 0;
  const ticks: number[] = [];
  for (let t = bottom; t <= top + step / 2; t += step) ticks.push(Math.round(t / step) * step);
  return { domain: [Math.min(bottom, low), top], ticks };
}
