import { queryOptions } from '@tanstack/react-query';
import type { QuartermasterToday } from '@shared/schemas/today-quartermaster';
import { api } from '@/lib/api-client';
import { todayKeys } from './keys';

/** What needs the quartermaster today; fetched afresh each time home opens. */
export const quartermasterTodayQueryOptions = () =>
  queryOptions({
    queryKey: todayKeys.role('quartermaster'),
    queryFn: () => api.get<QuartermasterToday>('/api/today/quartermaster'),
    refetchOnMount: 'always',
  });
