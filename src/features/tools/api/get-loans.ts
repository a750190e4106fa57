import { queryOptions } from '@tanstack/react-query';
import type { Loan } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { toolKeys } from './keys';

export const myLoansQueryOptions = () =>
  queryOptions({
    queryKey: toolKeys.myLoans(),
    queryFn: async () => (await api.get<{ data: Loan[] }>('/api/loans/mine')).data,
  });

export const openLoansQueryOptions = () =>
  queryOptions({
    queryKey: toolKeys.openLoans(),
    queryFn: async () => (await api.get<{ data: Loan[] }>('/api/loans/open')).data,
  });
