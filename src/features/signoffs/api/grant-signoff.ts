import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignoffGrant } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

export function useGrantSignoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ signoffId, userId }: { signoffId: number; userId: number }) =>
      api.post<SignoffGrant>(`/api/signoffs/${signoffId}/holders`, { userId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: signoffKeys.all }),
  });
}
