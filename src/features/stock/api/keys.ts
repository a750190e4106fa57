import type { BinListQuery, LedgerQuery } from '@shared/schemas/bins';
import { REORDER_ROOTS } from '@/lib/reorder-queries';

export const binKeys = {
  all: REORDER_ROOTS.bins,
  lists: () => ['bins', 'list'] as const,
  list: (filters: Partial<BinListQuery>) => ['bins', 'list', filters] as const,
  detail: (code: string) => ['bins', 'detail', code] as const,
  reorder: (code: string) => ['bins', 'reorder', code] as const,
  ledger: (code: string, range: Partial<LedgerQuery> = {}) => ['bins', 'ledger', code, range] as const,
  restock: () => ['bins', 'restock'] as const,
};
