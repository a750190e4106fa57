import { queryOptions } from '@tanstack/react-query';
import type { Spend } from '@shared/schemas/stock-money';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

export const spendQueryOptions = (months = 12) =>
  queryOptions({
    queryKey: stockMoneyKeys.spend(months),
    queryFn: async () => (await api.get<Spend>(`/api/stock/spend?months=${months}`)).months,
  });
