import { queryOptions } from '@tanstack/react-query';
import type { Build } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { buildKeys, type BuildListFilters } from './keys';

/** My builds with their assemblies; `all` asks for every member's (quartermaster and lead). */
export const buildsQueryOptions = (filters: BuildListFilters = {}) =>
  queryOptions({
    queryKey: buildKeys.list(filters),
    queryFn: async () => (await api.get<{ data: Build[] }>(filters.all ? '/api/builds?all=true' : '/api/builds')).data,
  });

export const buildQueryOptions = (id: number) =>
  queryOptions({
    queryKey: buildKeys.detail(id),
    queryFn: () => api.get<Build>(`/api/builds/${id}`),
    retry: false,
  });
