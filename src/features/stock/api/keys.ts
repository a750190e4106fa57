import type { BinListQuery, LedgerQuery } from '@shared/schemas/bins';

export const binKeys = {
  all: ['bins'] as const,
  lists: () => ['bins', 'list'] as const,
  list: (filters: Partial<BinListQuery>) => ['bins', 'list', filters] as const,
  detail: (code: string) => ['bins', 'detail', code] as const,
  ledger: (code: string, range: Partial<LedgerQuery> = {}) => ['bins', 'ledger', code, range] as const,
  restock: () => ['bins', 'restock'] as const,
};
