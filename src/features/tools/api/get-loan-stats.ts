import { queryOptions } from '@tanstack/react-query';
import type { LoanStats } from '@shared/schemas/loan-stats';
import { api } from '@/lib/api-client';
import { toolKeys } from './keys';

/** The lead's overview of the crib (`GET /api/loans/stats`). */
export const loanStatsQueryOptions = () =>
  queryOptions({
    queryKey: toolKeys.loanStats(),
    queryFn: () => api.get<LoanStats>('/api/loans/stats'),
  });
