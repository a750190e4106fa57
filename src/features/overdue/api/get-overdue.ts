import { queryOptions } from '@tanstack/react-query';
import type { OverdueList } from '@shared/schemas/overdue';
import { api } from '@/lib/api-client';
import { overdueKeys } from './keys';

export const overdueQueryOptions = () =>
  queryOptions({
    queryKey: overdueKeys.list(),
    queryFn: () => api.get<OverdueList>('/api/overdue'),
  });
