import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useWithdrawInvitation() {
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/invitations/${id}`),
    meta: { invalidates: shownOn.invitations },
  });
}
