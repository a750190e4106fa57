import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { peopleQueryOptions } from '@/features/people/api/get-people';
import { spendQueryOptions } from '@/features/stock-money/api/get-spend';
import { tabsQueryOptions } from '@/features/stock-money/api/get-tabs';
import { MemberTabs } from '@/features/stock-money/components/member-tabs';
import { RecordPaymentForm } from '@/features/stock-money/components/record-payment-form';
import { SpendChart } from '@/features/stock-money/components/spend-chart';
import { SpendTable } from '@/features/stock-money/components/spend-table';
import { kindsUsed, SPEND_WINDOWS, spendWindow } from '@/features/stock-money/utils/kinds-used';
import { SelectField } from '@/components/ui/field';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const spendLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const months = spendWindow(new URL(request.url).searchParams.get('months'));
  await loadAlongside(
    requireRole(queryClient, request, 'lead'),
    Promise.all([queryClient.ensureQueryData(spendQueryOptions(months)), queryClient.ensureQueryData(tabsQueryOptions()), queryClient.ensureQueryData(peopleQueryOptions())]),
  );
  return null;
};

export function SpendRoute() {
  const [params, setParams] = useSearchParams();
  const monthCount = spendWindow(params.get('months'));
  const { data: months } = useSuspenseQuery(spendQueryOptions(monthCount));
  const { data: tabs } = useSuspenseQuery(tabsQueryOptions());
  const { data: people } = useSuspenseQuery(peopleQueryOptions());
  const kinds = kindsUsed(months);
  // Anyone active may pay; someone who has left may still settle what they owe.
  const payers = new Map(people.filter((p) => p.active).map((p) => [p.id, { id: p.id, name: p.name }]));
  for (const t of tabs) payers.set(t.member.id, t.member);

  return (
    <>
      <PageHeader title="Consumables" lead="What the chapter’s bins cost: stock used by month and bin kind, what was bought, and members’ tabs." />
      <div className="flex flex-col gap-4">
        <Card title="Used by month">
          <div className="mb-3 max-w-56">
            <SelectField
              label="Show"
              value={String(monthCount)}
              onChange={(e) => setParams({ months: e.target.value }, { replace: true })}
              options={SPEND_WINDOWS.map((n) => ({ value: String(n), label: `Last ${n} months` }))}
            />
          </div>
          {kinds.length > 0 ? <SpendChart months={months} kinds={kinds} /> : <p className="text-steel">No stock was used in these months.</p>}
        </Card>
        <Card title="Month by month">
          <SpendTable months={months} kinds={kinds} />
        </Card>
        <Card title="Members’ tabs">
          <MemberTabs tabs={tabs} />
          <Link to="/payments" className="mt-3 inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
            Every payment, cash and online, with refunds
          </Link>
        </Card>
        <Card title="Record payment">
          <RecordPaymentForm payers={[...payers.values()].sort((a, b) => a.name.localeCompare(b.name))} />
        </Card>
      </div>
    </>
  );
}
