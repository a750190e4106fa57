import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { myLoansQueryOptions, openLoansQueryOptions } from '@/features/tools/api/get-loans';
import { LoanHistoryList, OpenLoanList } from '@/features/tools/components/loan-list';
import { Card, PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const loansLoader = pageLoader('signed-in', [myLoansQueryOptions()]);

function EveryonesLoans() {
  const loans = useQuery(openLoansQueryOptions());
  return (
    <Card title="Who holds what">
      {loans.data ? <OpenLoanList loans={loans.data} showHolder empty="No tool is out right now." /> : <p>Loading…</p>}
    </Card>
  );
}

export function LoansRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: loans } = useSuspenseQuery(myLoansQueryOptions());
  const open = loans.filter((l) => !l.returnedAt);
  const past = loans.filter((l) => l.returnedAt);
  return (
    <>
      <PageHeader title="My loans" lead="What you have from the crib, and when it goes back." />
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title={`Out with you (${open.length})`}>
          <OpenLoanList loans={open} empty="You have nothing from the crib. Scan a label to borrow a tool." />
        </Card>
        {me && hasRole(me.role, 'quartermaster') && <EveryonesLoans />}
        <Card title="Returned">
          <LoanHistoryList loans={past} />
        </Card>
      </div>
    </>
  );
}
