import { queryOptions } from '@tanstack/react-query';
import type { Tab } from '@shared/schemas/stock-money';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

export const myTabQueryOptions = () =>
  queryOptions({
    queryKey: stockMoneyKeys.tab('me'),
    queryFn: () => api.get<Tab>('/api/stock/tab'),
  });
