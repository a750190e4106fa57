import { useMutation } from '@tanstack/react-query';
import type { Payment, RecordPaymentBody } from '@shared/schemas/stock-money';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useRecordPayment() {
  return useMutation({
    mutationFn: (body: RecordPaymentBody) => api.post<Payment>('/api/stock/payments', body),
    // A payment moves the list of tabs, the payer's own tab and the payments list.
    meta: { invalidates: shownOn.payment },
  });
}
