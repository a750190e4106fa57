import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export function useWithdrawInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/invitations/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.invitations() }),
  });
}
