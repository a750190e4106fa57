import { useMutation } from '@tanstack/react-query';
import type { Person, UpdatePersonBody } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useUpdatePerson() {
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: UpdatePersonBody }) => api.patch<Person>(`/api/users/${id}`, change),
    meta: { invalidates: shownOn.person },
  });
}
