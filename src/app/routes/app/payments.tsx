import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { paymentsQueryOptions } from '@/features/stock-money/api/get-payments';
import { refusedCheckoutsQueryOptions } from '@/features/stock-money/api/get-refused-checkouts';
import { PaymentFilters } from '@/features/stock-money/components/payment-filters';
import { PaymentsTable } from '@/features/stock-money/components/payments-table';
import { RefusedCheckouts } from '@/features/stock-money/components/refused-checkouts';
import { paymentsQueryOf } from '@/features/stock-money/utils/payments-query';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const paymentsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await loadAlongside(
    requireRole(queryClient, request, 'quartermaster'),
    Promise.all([
      queryClient.ensureQueryData(paymentsQueryOptions(paymentsQueryOf(new URL(request.url).searchParams))),
      queryClient.ensureQueryData(refusedCheckoutsQueryOptions()),
    ]),
  );
  return null;
};

/** Cash and online payments on members' tabs together; the lead refunds online ones here. */
export function PaymentsRoute() {
  const [params] = useSearchParams();
  const query = paymentsQueryOf(params);
  const { data: payments } = useSuspenseQuery(paymentsQueryOptions(query));
  const { data: refused } = useSuspenseQuery(refusedCheckoutsQueryOptions());
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const canRefund = me !== null && hasRole(me.role, 'lead');

  return (
    <>
      <PageHeader
        title="Payments"
        lead={
          canRefund
            ? 'Every payment on members’ tabs, in cash or online, newest first. Refund an online payment here; cash is handed back in person.'
            : 'Every payment on members’ tabs, in cash or online, newest first.'
        }
      />
      <div className="flex flex-col gap-4">
        <RefusedCheckouts refused={refused} />
        <Card title="Filters">
          <PaymentFilters query={query} />
        </Card>
        <Card title={payments.length === 1 ? '1 payment' : `${payments.length} payments`}>
          <PaymentsTable payments={payments} canRefund={canRefund} />
        </Card>
      </div>
    </>
  );
}
