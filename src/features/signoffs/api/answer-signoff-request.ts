import { useMutation } from '@tanstack/react-query';
import type { AskSignoffBody, SignoffRequest } from '@shared/schemas/signoff-requests';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useAskForSignoff() {
  return useMutation({
    mutationFn: (body: AskSignoffBody) => api.post<SignoffRequest>('/api/signoffs/requests', body),
    meta: { invalidates: shownOn.signoffs },
  });
}

/** Granting goes through the grant itself (useGrantSignoff), which closes the request on the server. */
export function useDeclineSignoffRequest() {
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) => api.post<SignoffRequest>(`/api/signoffs/requests/${id}/decline`, { reason }),
    meta: { invalidates: shownOn.signoffs },
  });
}
