import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Assembly, CreateAssemblyBody, UpdateAssemblyBody } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { invalidateReorderFamily } from '@/lib/reorder-queries';
import { assemblyKeys, buildKeys } from './keys';

/**
 * An assembly shows on its build, in the assembly lists and in its own estimate, and its planned
 * need moves the forecast and with it what to order (Restock, alerts, bins): refresh them all.
 */
function useRefreshPlans() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([queryClient.invalidateQueries({ queryKey: buildKeys.all }), queryClient.invalidateQueries({ queryKey: assemblyKeys.all }), invalidateReorderFamily(queryClient)]);
}

export function useCreateAssembly(buildId: number) {
  const refresh = useRefreshPlans();
  return useMutation({
    mutationFn: (body: CreateAssemblyBody) => api.post<Assembly>(`/api/builds/${buildId}/assemblies`, body),
    onSuccess: refresh,
  });
}

export function useUpdateAssembly(id: number) {
  const refresh = useRefreshPlans();
  return useMutation({
    mutationFn: (change: UpdateAssemblyBody) => api.patch<Assembly>(`/api/assemblies/${id}`, change),
    onSuccess: refresh,
  });
}

export function useDeleteAssembly(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`/api/assemblies/${id}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: assemblyKeys.detail(id) });
      queryClient.removeQueries({ queryKey: assemblyKeys.estimate(id) });
      return Promise.all([queryClient.invalidateQueries({ queryKey: buildKeys.all }), queryClient.invalidateQueries({ queryKey: assemblyKeys.all }), invalidateReorderFamily(queryClient)]);
    },
  });
}
