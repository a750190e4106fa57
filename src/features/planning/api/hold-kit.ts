import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KitHoldsResult } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './keys';

/** One action places holds on every free tool of the assembly's crib kit; the kit's statuses change. */
export function useHoldKit(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<KitHoldsResult>(`/api/assemblies/${id}/kit/holds`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assemblyKeys.estimate(id) }),
  });
}
