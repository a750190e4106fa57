import { queryOptions } from '@tanstack/react-query';
import type { LeadToday } from '@shared/schemas/today-lead';
import { api } from '@/lib/api-client';
import { todayKeys } from './keys';

/** What needs a chapter lead today; fresh whenever home is opened. */
export const leadTodayQueryOptions = () =>
  queryOptions({
    queryKey: todayKeys.role('lead'),
    queryFn: () => api.get<LeadToday>('/api/today/lead'),
    refetchOnMount: 'always',
  });
