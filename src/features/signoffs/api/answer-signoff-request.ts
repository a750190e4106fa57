import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AskSignoffBody, SignoffRequest } from '@shared/schemas/signoff-requests';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

export function useAskForSignoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AskSignoffBody) => api.post<SignoffRequest>('/api/signoffs/requests', body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: signoffKeys.myRequests() }),
  });
}

/** Granting goes through the grant itself (useGrantSignoff), which closes the request on the server. */
export function useDeclineSignoffRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) => api.post<SignoffRequest>(`/api/signoffs/requests/${id}/decline`, { reason }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: signoffKeys.requests() }),
  });
}
