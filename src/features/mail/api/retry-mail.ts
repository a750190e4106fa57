import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MailMessage } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './keys';

export function useRetryMail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<MailMessage>(`/api/mail/${id}/retry`, {}),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mailKeys.all }),
  });
}
