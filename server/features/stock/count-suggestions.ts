import { binDesignation } from '@shared/stock/fasteners';
import { valueCents } from '@shared/stock/money';
import type { Database } from '../../db/client';
import type { BinRow } from '../../db/schema/stock';
import { allBinsBySupplier, lastCountedAt } from './bins.repo';

export const COUNT_SUGGESTIONS = 5;
/** How many of the longest-uncounted bins the suggestions are picked from. */
export const COUNT_POOL = 10;
export const COUNT_RULE = `Of the ${COUNT_POOL} bins that have gone longest without a count (never counted ones first), the ${COUNT_SUGGESTIONS} holding the most stock by value.`;

export interface CountSuggestion {
  bin: BinRow;
  designation: string;
  lastCountedAt: Date | null;
  valueCents: number;
}

const countedMs = (s: CountSuggestion) => s.lastCountedAt?.getTime() ?? -Infinity;

/** Bins to count today by COUNT_RULE; bins last counted alike (never, say) enter the pool by value, then code. A read only. */
export function suggestBinsToCount(db: Database): CountSuggestion[] {
  const all = allBinsBySupplier(db);
  const counted = lastCountedAt(db, all.map((b) => b.id));
  return all
    .map((bin) => ({ bin, designation: binDesignation(bin), lastCountedAt: counted.get(bin.id) ?? null, valueCents: valueCents(bin.onHand, bin.unitCostE4) }))
    .sort((a, b) => countedMs(a) - countedMs(b) || b.valueCents - a.valueCents || a.bin.code.localeCompare(b.bin.code))
    .slice(0, COUNT_POOL)
    .sort((a, b) => b.valueCents - a.valueCents || a.bin.code.localeCompare(b.bin.code))
    .slice(0, COUNT_SUGGESTIONS);
}
