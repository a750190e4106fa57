import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateSignoffInput, Signoff, UpdateSignoffBody } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

/** Defines a new sign-off, or renames and describes one when `id` is given. */
export function useSaveSignoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id?: number; body: CreateSignoffInput | UpdateSignoffBody }) =>
      id === undefined ? api.post<Signoff>('/api/signoffs', body) : api.patch<Signoff>(`/api/signoffs/${id}`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: signoffKeys.all }),
  });
}
