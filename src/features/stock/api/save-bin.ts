import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Bin, CreateBinBody, UpdateBinBody } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { binKeys } from './keys';

export function useCreateBin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBinBody) => api.post<Bin>('/api/bins', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: binKeys.all }),
  });
}

/** Spec, reorder figures or supplier changed: the list, the bin and the Restock list may all show it. */
export function useEditBin(code: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateBinBody) => api.patch<Bin>(`/api/bins/${encodeURIComponent(code)}`, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: binKeys.all }),
  });
}
