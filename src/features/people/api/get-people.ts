import { queryOptions } from '@tanstack/react-query';
import type { Person } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export const peopleQueryOptions = () =>
  queryOptions({
    queryKey: peopleKeys.list(),
    queryFn: async () => (await api.get<{ data: Person[] }>('/api/users')).data,
  });
