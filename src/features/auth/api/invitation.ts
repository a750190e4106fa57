import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationBody, InvitationPreview, LoginResponse } from '@shared/schemas/auth';
import { api, setCsrfToken } from '@/lib/api-client';
import { setChapterTimeZone } from '@/lib/chapter-zone';
import { authKeys } from './keys';

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: () => api.get<InvitationPreview>(`/api/invitations/by-token/${encodeURIComponent(token)}`),
    retry: false,
  });

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: AcceptInvitationBody) => {
      const res = await api.post<LoginResponse>('/api/invitations/accept', body);
      setCsrfToken(res.csrfToken);
      setChapterTimeZone(res.timeZone);
      return res.user;
    },
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
