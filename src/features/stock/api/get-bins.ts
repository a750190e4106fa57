import { queryOptions } from '@tanstack/react-query';
import type { BinForYou, BinList, BinListQuery } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { binKeys } from './keys';

/** All bins for the list page; it filters on the phone, so one page of 500 (the server's most). */
export const binsQueryOptions = (filters: Partial<BinListQuery> = { pageSize: 500 }) =>
  queryOptions({
    queryKey: binKeys.list(filters),
    queryFn: () => {
      const params = new URLSearchParams(Object.entries(filters).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));
      return api.get<BinList>(`/api/bins?${params.toString()}`);
    },
  });

/** One bin with what the signed-in person may do with it. */
export const binQueryOptions = (code: string) =>
  queryOptions({
    queryKey: binKeys.detail(code),
    queryFn: () => api.getOrGiveUp<BinForYou>(`/api/bins/${encodeURIComponent(code)}`),
    retry: false,
  });
