import { queryOptions } from '@tanstack/react-query';
import type { CheckoutStatus } from '@shared/schemas/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from './keys';

/** How often My tab asks again while the provider's webhook is on its way. */
export const CHECKOUT_POLL_MS = 1_500;

/** A checkout's state, asked again every 1.5 s while it is still open; paid, refused and expired are final, and so is not found. */
export const checkoutStatusQueryOptions = (sessionId: string) =>
  queryOptions({
    queryKey: paymentKeys.checkout(sessionId),
    queryFn: () => api.get<CheckoutStatus>(`/api/payments/checkouts/${encodeURIComponent(sessionId)}`),
    refetchInterval: (query) => (query.state.status !== 'error' && (query.state.data?.state ?? 'open') === 'open' ? CHECKOUT_POLL_MS : false),
  });
