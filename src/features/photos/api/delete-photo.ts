import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useDeletePhoto() {
  return useMutation({ mutationFn: (id: number) => api.delete(`/api/photos/${id}`), meta: { invalidates: shownOn.toolSpec } });
}
