import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useRevokeSignoff() {
  return useMutation({
    mutationFn: ({ signoffId, userId }: { signoffId: number; userId: number }) => api.delete(`/api/signoffs/${signoffId}/holders/${userId}`),
    meta: { invalidates: shownOn.signoffs },
  });
}
