import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Refund, RefundBody } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { stockMoneyKeys } from './keys';

/** The lead refunds an online payment through the provider. */
export function useRefundPayment(paymentId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RefundBody) => api.post<Refund>(`/api/payments/${paymentId}/refund`, body),
    // A refund moves the list of payments, the list of tabs and the member's own tab.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: stockMoneyKeys.anyPayments() }),
        queryClient.invalidateQueries({ queryKey: stockMoneyKeys.tabs() }),
        queryClient.invalidateQueries({ queryKey: stockMoneyKeys.anyTab() }),
      ]),
  });
}
