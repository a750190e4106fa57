import type { SpendMonth } from '@shared/schemas/stock-money';
import { BIN_KINDS, type BinKind } from '@shared/stock/kinds';

/** The bin kinds with any use in the window, in the fixed BIN_KINDS order (so colours stay put). */
export const kindsUsed = (months: SpendMonth[]): BinKind[] => BIN_KINDS.filter((k) => months.some((m) => m.byKind[k] !== 0));

/** The windows the lead can pick; anything else falls back to a year. */
export const SPEND_WINDOWS = [6, 12, 24] as const;
export const spendWindow = (value: string | null): number => {
  const n = Number(value);
  return (SPEND_WINDOWS as readonly number[]).includes(n) ? n : 12;
};
