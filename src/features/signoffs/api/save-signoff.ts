import { useMutation } from '@tanstack/react-query';
import type { CreateSignoffInput, Signoff, UpdateSignoffBody } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** Defines a new sign-off, or renames and describes one when `id` is given. */
export function useSaveSignoff() {
  return useMutation({
    mutationFn: ({ id, body }: { id?: number; body: CreateSignoffInput | UpdateSignoffBody }) =>
      id === undefined ? api.post<Signoff>('/api/signoffs', body) : api.patch<Signoff>(`/api/signoffs/${id}`, body),
    meta: { invalidates: shownOn.signoffs },
  });
}
