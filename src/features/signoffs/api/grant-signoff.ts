import { useMutation } from '@tanstack/react-query';
import type { SignoffGrant } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useGrantSignoff() {
  return useMutation({
    mutationFn: ({ signoffId, userId }: { signoffId: number; userId: number }) =>
      api.post<SignoffGrant>(`/api/signoffs/${signoffId}/holders`, { userId }),
    meta: { invalidates: shownOn.signoffs },
  });
}
