import { queryOptions } from '@tanstack/react-query';
import type { BinList } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { labelKeys } from './keys';

/** Every stock bin (up to 500), to pick the ones that need a label. */
export const labelBinsQueryOptions = () =>
  queryOptions({
    queryKey: labelKeys.bins(),
    queryFn: async () => (await api.get<BinList>('/api/bins?pageSize=500')).data,
  });
