import { useMutation } from '@tanstack/react-query';
import type { KitHoldsResult } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** One action places holds on every free tool of the assembly's crib kit; the kit's statuses and the tools' holds change. */
export function useHoldKit(id: number) {
  return useMutation({
    mutationFn: () => api.post<KitHoldsResult>(`/api/assemblies/${id}/kit/holds`),
    meta: { invalidates: shownOn.toolState },
  });
}
