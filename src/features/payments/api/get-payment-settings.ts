import { queryOptions } from '@tanstack/react-query';
import type { PaymentSettingsView } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from './keys';

export const paymentSettingsQueryOptions = () =>
  queryOptions({
    queryKey: paymentKeys.settings(),
    queryFn: () => api.get<PaymentSettingsView>('/api/payments/settings'),
  });
