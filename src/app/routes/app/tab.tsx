import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { paymentSettingsQueryOptions } from '@/features/payments/api/get-payment-settings';
import { PayOnlineCard } from '@/features/payments/components/pay-online-card';
import { PaymentReturn, paymentReturnOf } from '@/features/payments/components/payment-return';
import { myTabQueryOptions } from '@/features/stock-money/api/get-my-tab';
import { TabView } from '@/features/stock-money/components/tab-view';
import { PageHeader } from '@/components/ui/page';
import { refreshShown, shownOn } from '@/lib/query-keys';
import { loadAlongside, requireSignedIn } from './guards';

export const tabLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await loadAlongside(requireSignedIn(queryClient, request), Promise.all([queryClient.ensureQueryData(myTabQueryOptions()), queryClient.prefetchQuery(paymentSettingsQueryOptions())]));
  return null;
};

export function TabRoute() {
  const { data: tab } = useSuspenseQuery(myTabQueryOptions());
  const [search] = useSearchParams();
  const queryClient = useQueryClient();
  const returned = paymentReturnOf(search);
  // The provider's confirmation came in: the balance on this page drops without a reload.
  const refreshTab = useCallback(() => void refreshShown(queryClient, shownOn.payment), [queryClient]);
  return (
    <>
      <PageHeader title="My tab" lead="What you drew from the bins, valued at the unit cost on the day, and what you have paid." />
      {returned && <PaymentReturn {...returned} onPaid={refreshTab} />}
      <TabView tab={tab} afterBalance={<PayOnlineCard balanceCents={tab.balanceCents} />} />
    </>
  );
}
