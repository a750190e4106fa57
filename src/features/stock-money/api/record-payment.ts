import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Payment, RecordPaymentBody } from '@shared/schemas/stock-money';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

export function useRecordPayment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordPaymentBody) => api.post<Payment>('/api/stock/payments', body),
    // A payment moves the list of tabs and the payer's own tab; spend is unaffected.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: stockMoneyKeys.tabs() }),
        queryClient.invalidateQueries({ queryKey: stockMoneyKeys.anyTab() }),
      ]),
  });
}
