import { queryOptions } from '@tanstack/react-query';
import type { Assembly, AssemblyEstimate } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './keys';

export const assemblyQueryOptions = (id: number) =>
  queryOptions({
    queryKey: assemblyKeys.detail(id),
    queryFn: () => api.get<Assembly>(`/api/assemblies/${id}`),
    retry: false,
  });

/** The saved assembly's estimate with its bill (bins, on hand, drawn) and crib kit. */
export const assemblyEstimateQueryOptions = (id: number) =>
  queryOptions({
    queryKey: assemblyKeys.estimate(id),
    queryFn: () => api.get<AssemblyEstimate>(`/api/assemblies/${id}/estimate`),
    retry: false,
  });
