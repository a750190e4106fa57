import { useMutation } from '@tanstack/react-query';
import type { MailMessage } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useRetryMail() {
  return useMutation({
    mutationFn: (id: number) => api.post<MailMessage>(`/api/mail/${id}/retry`, {}),
    meta: { invalidates: shownOn.mail },
  });
}
