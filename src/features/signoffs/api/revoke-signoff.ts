import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

export function useRevokeSignoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ signoffId, userId }: { signoffId: number; userId: number }) => api.delete(`/api/signoffs/${signoffId}/holders/${userId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: signoffKeys.all }),
  });
}
