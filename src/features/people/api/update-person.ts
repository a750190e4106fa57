import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Person, UpdatePersonBody } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export function useUpdatePerson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: UpdatePersonBody }) => api.patch<Person>(`/api/users/${id}`, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.list() }),
  });
}
