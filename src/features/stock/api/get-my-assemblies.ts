import { queryOptions } from '@tanstack/react-query';
import type { Assembly } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { assemblyKeys } from '@/lib/query-keys';

/**
 * The signed-in member's own assemblies, for naming one on a draw: the planning screens' key for the
 * same list, so saving an assembly refreshes this picker too.
 */
export const myAssembliesQueryOptions = () =>
  queryOptions({
    queryKey: assemblyKeys.list({ mine: true }),
    queryFn: async () => (await api.get<{ data: Assembly[] }>('/api/assemblies?mine=true')).data,
    staleTime: 60_000,
  });
