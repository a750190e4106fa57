import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Assembly, CreateAssemblyBody, UpdateAssemblyBody } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';
import { assemblyKeys } from './keys';

/**
 * An assembly shows on its build, in the assembly lists and in its own estimate, and its planned
 * need moves the forecast and with it what to order (Restock, alerts, bins): `shownOn.plans`.
 */
export function useCreateAssembly(buildId: number) {
  return useMutation({
    mutationFn: (body: CreateAssemblyBody) => api.post<Assembly>(`/api/builds/${buildId}/assemblies`, body),
    meta: { invalidates: shownOn.plans },
  });
}

export function useUpdateAssembly(id: number) {
  return useMutation({
    mutationFn: (change: UpdateAssemblyBody) => api.patch<Assembly>(`/api/assemblies/${id}`, change),
    meta: { invalidates: shownOn.plans },
  });
}

/** The deleted assembly's own page is dropped, not refetched (it would answer 404). */
export function useDeleteAssembly(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`/api/assemblies/${id}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: assemblyKeys.detail(id) });
      queryClient.removeQueries({ queryKey: assemblyKeys.estimate(id) });
    },
    meta: { invalidates: shownOn.plans },
  });
}
