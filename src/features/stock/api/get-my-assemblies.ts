import { queryOptions } from '@tanstack/react-query';
import type { Assembly } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';

/**
 * The signed-in member's own assemblies, for naming one on a draw. The key has the shape the
 * planning screens use for the same list, so saving an assembly refreshes this picker too.
 */
export const myAssembliesQueryOptions = () =>
  queryOptions({
    queryKey: ['assemblies', 'list', { mine: true }] as const,
    queryFn: async () => (await api.get<{ data: Assembly[] }>('/api/assemblies?mine=true')).data,
    staleTime: 60_000,
  });
