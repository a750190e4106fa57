import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ALERT_FILTERS, alertFilter, alertsQueryOptions } from '@/features/forecast/api/get-alerts';
import { purchaseListQueryOptions } from '@/features/forecast/api/get-purchase-list';
import { AlertList } from '@/features/forecast/components/alert-list';
import { CheckNowButton } from '@/features/forecast/components/check-now-button';
import { PurchaseList } from '@/features/forecast/components/purchase-list';
import { SelectField } from '@/components/ui/field';
import { PageHeading } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const alertsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const state = alertFilter(new URL(request.url).searchParams.get('state'));
  await loadAlongside(
    requireRole(queryClient, request, 'quartermaster'),
    Promise.all([queryClient.ensureQueryData(alertsQueryOptions(state)), queryClient.ensureQueryData(purchaseListQueryOptions())]),
  );
  return null;
};

const JUMP = 'inline-flex min-h-12 items-center rounded-lg border-2 border-edge bg-card px-4 font-semibold hover:bg-paper';

export function AlertsRoute() {
  const [params, setParams] = useSearchParams();
  const state = alertFilter(params.get('state'));
  const { data: alerts } = useSuspenseQuery(alertsQueryOptions(state));
  const { data: purchase } = useSuspenseQuery(purchaseListQueryOptions());
  return (
    <>
      <header className="mb-5 flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <PageHeading title="Reorder alerts" className="tracking-tight" />
            <p className="mt-1 text-steel">Bins at or below their reorder point, or projected to dip under safety stock before an order could arrive.</p>
          </div>
          <CheckNowButton />
        </div>
        <nav aria-label="On this page" className="flex flex-wrap gap-2">
          <a href="#alerts" className={JUMP}>
            Alerts
          </a>
          <a href="#purchase-list" className={JUMP}>
            Purchase list
          </a>
        </nav>
      </header>
      <section id="alerts" aria-labelledby="alerts-heading" className="flex scroll-mt-4 flex-col gap-3">
        <h2 id="alerts-heading" className="sr-only">
          Alerts
        </h2>
        <div className="max-w-72">
          <SelectField
            label="Show"
            value={state}
            onChange={(e) => setParams(e.target.value === 'active' ? {} : { state: e.target.value }, { replace: true })}
            options={ALERT_FILTERS}
          />
        </div>
        <AlertList alerts={alerts} filter={state} />
      </section>
      <section id="purchase-list" aria-labelledby="purchase-heading" className="mt-8 flex scroll-mt-4 flex-col gap-3">
        <div>
          <h2 id="purchase-heading" className="text-xl font-bold">
            Purchase list
          </h2>
          <p className="text-steel">What to order now, by supplier, in whole packs: the same bins and quantities as the Restock list.</p>
        </div>
        <PurchaseList groups={purchase} />
      </section>
    </>
  );
}
