import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReminderSent } from '@shared/schemas/overdue';
import { api } from '@/lib/api-client';
import { overdueKeys } from './keys';

export function useSendReminder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (loanId: number) => api.post<ReminderSent>(`/api/overdue/${loanId}/remind`),
    // A refusal (already sent today, returned meanwhile) also means the list is out of date.
    onSettled: () => queryClient.invalidateQueries({ queryKey: overdueKeys.list() }),
  });
}
