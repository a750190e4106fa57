import { queryOptions } from '@tanstack/react-query';
import type { LedgerEntry } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { binKeys } from './keys';

/** A bin's ledger, newest first (the server's default window of 500 entries). */
export const ledgerQueryOptions = (code: string) =>
  queryOptions({
    queryKey: binKeys.ledger(code),
    queryFn: async () => (await api.get<{ data: LedgerEntry[] }>(`/api/bins/${encodeURIComponent(code)}/ledger`)).data,
  });
