import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/auth/logout'),
    onSuccess: () => {
      setCsrfToken(undefined);
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
