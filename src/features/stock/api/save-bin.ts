import { useMutation } from '@tanstack/react-query';
import type { Bin, CreateBinBody, UpdateBinBody } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useCreateBin() {
  return useMutation({
    mutationFn: (body: CreateBinBody) => api.post<Bin>('/api/bins', body),
    meta: { invalidates: shownOn.binSpec },
  });
}

/** Spec, reorder figures or supplier changed: the list, the bin, the Restock list, the alerts and the forecast may all show it. */
export function useEditBin(code: string) {
  return useMutation({
    mutationFn: (change: UpdateBinBody) => api.patch<Bin>(`/api/bins/${encodeURIComponent(code)}`, change),
    meta: { invalidates: shownOn.binSpec },
  });
}
