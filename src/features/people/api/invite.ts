import { useMutation } from '@tanstack/react-query';
import type { InviteBody, PendingInvitation } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useInvite() {
  return useMutation({
    mutationFn: (body: InviteBody) => api.post<PendingInvitation>('/api/invitations', body),
    meta: { invalidates: shownOn.invitations },
  });
}
