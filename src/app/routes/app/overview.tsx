import { useSuspenseQuery } from '@tanstack/react-query';
import { spendQueryOptions } from '@/features/stock-money/api/get-spend';
import { SpendChart } from '@/features/stock-money/components/spend-chart';
import { SpendFigures } from '@/features/stock-money/components/spend-figures';
import { kindsUsed } from '@/features/stock-money/utils/kinds-used';
import { loanStatsQueryOptions } from '@/features/tools/api/get-loan-stats';
import { LoansPerWeek } from '@/features/tools/components/overview/loans-per-week';
import { OverdueDaysPerWeek } from '@/features/tools/components/overview/overdue-days-per-week';
import { IdleTools, MostUsedTools } from '@/features/tools/components/overview/tool-use-tables';
import { ChartBesideTable } from '@/components/ui/chart-figure';
import { Card, PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

/** The year of consumables the overview shows, as the Consumables page does by default. */
const SPEND_MONTHS = 12;

export const overviewLoader = pageLoader('lead', [loanStatsQueryOptions(), spendQueryOptions(SPEND_MONTHS)]);

/** The lead's overview: the crib's use week by week, its busiest and idle tools, and what consumables cost. */
export function OverviewRoute() {
  const { data: stats } = useSuspenseQuery(loanStatsQueryOptions());
  const { data: months } = useSuspenseQuery(spendQueryOptions(SPEND_MONTHS));
  const binKinds = kindsUsed(months);
  return (
    <>
      <PageHeader title="Overview" lead="How the crib is used week by week, which tools earn their place, and what consumables cost." />
      <div className="flex flex-col gap-4">
        <Card title="Loans per week">
          {stats.kinds.length > 0 ? <LoansPerWeek weeks={stats.weeks} kinds={stats.kinds} /> : <p className="text-steel">No tool was lent in these weeks.</p>}
        </Card>
        <Card title="Days overdue per week">
          <OverdueDaysPerWeek weeks={stats.weeks} />
        </Card>
        <Card title="Tools used most">
          <MostUsedTools tools={stats.mostUsed} weeks={stats.weeks.length} />
        </Card>
        <Card title="Not lent in six months">
          <p className="mb-3 text-sm text-ink-soft">Candidates to sell, or to move where builders would use them.</p>
          <IdleTools tools={stats.idle} since={stats.idleSince} />
        </Card>
        <Card title="Consumables used by month">
          {binKinds.length > 0 ? (
            <ChartBesideTable chart={<SpendChart months={months} kinds={binKinds} />} table={<SpendFigures months={months} kinds={binKinds} />} />
          ) : (
            <p className="text-steel">No stock was used in these months.</p>
          )}
        </Card>
      </div>
    </>
  );
}
