import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteBody, PendingInvitation } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export function useInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InviteBody) => api.post<PendingInvitation>('/api/invitations', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.invitations() }),
  });
}
