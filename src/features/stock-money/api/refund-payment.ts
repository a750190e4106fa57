import { useMutation } from '@tanstack/react-query';
import type { Refund, RefundBody } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** The lead refunds an online payment through the provider. */
export function useRefundPayment(paymentId: number) {
  return useMutation({
    mutationFn: (body: RefundBody) => api.post<Refund>(`/api/payments/${paymentId}/refund`, body),
    // A refund moves the list of payments, the list of tabs and the member's own tab.
    meta: { invalidates: shownOn.payment },
  });
}
