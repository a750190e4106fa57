import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Bin, CreateBinBody, UpdateBinBody } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { invalidateReorderFamily } from '@/lib/reorder-queries';

export function useCreateBin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBinBody) => api.post<Bin>('/api/bins', body),
    onSuccess: () => invalidateReorderFamily(queryClient),
  });
}

/** Spec, reorder figures or supplier changed: the list, the bin, the Restock list, the alerts and the forecast may all show it. */
export function useEditBin(code: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateBinBody) => api.patch<Bin>(`/api/bins/${encodeURIComponent(code)}`, change),
    onSuccess: () => invalidateReorderFamily(queryClient),
  });
}
