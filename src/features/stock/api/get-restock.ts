import { queryOptions } from '@tanstack/react-query';
import type { RestockItem } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { binKeys } from './keys';

export const restockQueryOptions = () =>
  queryOptions({
    queryKey: binKeys.restock(),
    queryFn: async () => (await api.get<{ data: RestockItem[] }>('/api/bins/restock')).data,
  });
