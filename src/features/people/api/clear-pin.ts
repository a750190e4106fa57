import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** A lead clears someone's station PIN; they set a new one on their Settings page. */
export function useClearPin() {
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/users/${id}/pin`),
    meta: { invalidates: shownOn.person },
  });
}
