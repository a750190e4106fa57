import { queryOptions } from '@tanstack/react-query';
import type { TabList } from '@shared/schemas/stock-money';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

/** Everyone with something charged or paid (quartermaster and lead). */
export const tabsQueryOptions = () =>
  queryOptions({
    queryKey: stockMoneyKeys.tabs(),
    queryFn: async () => (await api.get<TabList>('/api/stock/tabs')).data,
  });
