import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PaymentSettingsView, UpdatePaymentSettingsBody } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from './keys';

export function useUpdatePaymentSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdatePaymentSettingsBody) => api.put<PaymentSettingsView>('/api/payments/settings', body),
    onSuccess: (saved) => queryClient.setQueryData(paymentKeys.settings(), saved),
  });
}
