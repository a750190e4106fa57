import { useMutation } from '@tanstack/react-query';
import type { CheckoutBody, CheckoutResponse } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';

/** Opens a hosted checkout for the signed-in member's own tab; the answer is the provider's page. */
export function useStartCheckout() {
  return useMutation({
    mutationFn: (body: CheckoutBody) => api.post<CheckoutResponse>('/api/payments/checkout', body),
  });
}
