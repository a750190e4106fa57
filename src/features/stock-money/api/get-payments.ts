import { queryOptions } from '@tanstack/react-query';
import type { PaymentList, PaymentsQuery } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { paymentsSearch } from '../utils/payments-query';
import { stockMoneyKeys } from './keys';

/** Cash and online payments together, newest first (quartermaster and lead). */
export const paymentsQueryOptions = (query: PaymentsQuery) =>
  queryOptions({
    queryKey: stockMoneyKeys.payments(query),
    queryFn: async () => (await api.get<PaymentList>(`/api/payments${paymentsSearch(query)}`)).data,
  });
