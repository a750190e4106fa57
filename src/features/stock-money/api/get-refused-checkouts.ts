import { queryOptions } from '@tanstack/react-query';
import type { RefusedCheckoutList } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

/** Online checkouts refused because the provider reported another amount, newest first (quartermaster and lead). */
export const refusedCheckoutsQueryOptions = () =>
  queryOptions({
    queryKey: stockMoneyKeys.refusedCheckouts(),
    queryFn: async () => (await api.get<RefusedCheckoutList>('/api/payments/refused')).data,
  });
