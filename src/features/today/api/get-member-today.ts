import { queryOptions } from '@tanstack/react-query';
import type { MemberToday } from '@shared/schemas/today-member';
import { api } from '@/lib/api-client';
import { todayKeys } from './keys';

/** What needs the signed-in person today; fresh whenever home opens. */
export const memberTodayQueryOptions = () =>
  queryOptions({
    queryKey: todayKeys.role('member'),
    queryFn: () => api.get<MemberToday>('/api/today/member'),
    refetchOnMount: 'always',
  });
