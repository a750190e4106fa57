import { useMutation } from '@tanstack/react-query';
import type { ReminderSent } from '@shared/schemas/overdue';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useSendReminder() {
  return useMutation({
    mutationFn: (loanId: number) => api.post<ReminderSent>(`/api/overdue/${loanId}/remind`),
    // A refusal (already sent today, returned meanwhile) also means the list is out of date.
    meta: { invalidates: shownOn.reminder },
  });
}
