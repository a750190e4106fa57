import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { LeadToday as LeadTodayAnswer } from '@shared/schemas/today-lead';
import { LateBadge } from '@/features/overdue/components/late-badge';
import { ReminderButton } from '@/features/overdue/components/reminder-button';
import { monthName } from '@/features/stock-money/components/format';
import { SignoffRequestList } from '@/features/signoffs/components/signoff-request-list';
import { leadTodayQueryOptions } from '@/features/today/api/get-lead-today';
import { Card, Code } from '@/components/ui/page';
import { formatCents, formatCount, formatQuantity } from '@/lib/format';

const LINK = 'inline-flex min-h-11 items-center font-semibold underline underline-offset-4';
const FIGURE_LINK = 'flex min-h-11 flex-col rounded-lg bg-paper p-3 hover:bg-rule/40';

/** "All 7 overdue loans", or "Open Overdue" for a single one: the way to the screen where they are dealt with. */
function AllLink({ to, total, what, page }: { to: string; total: number; what: string; page: string }) {
  return (
    <p className="mt-2">
      <Link to={to} className={LINK}>
        {total === 1 ? `Open ${page}` : `All ${formatCount(total)} ${what}`}
      </Link>
    </p>
  );
}

function Overdue({ overdue }: { overdue: LeadTodayAnswer['overdue'] }) {
  if (overdue.total === 0) return <Card title="Overdue"><p>Nothing is overdue.</p></Card>;
  return (
    <Card title={`Overdue (${formatCount(overdue.total)})`}>
      <ul className="divide-y divide-rule">
        {overdue.loans.map((loan) => (
          <li key={loan.loanId} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-start sm:justify-between">
            <div className="flex flex-col items-start gap-1">
              <Link to={`/tools/${loan.tool.code}`} className="inline-block min-h-11 py-2.5 font-semibold underline underline-offset-4">
                <span className="whitespace-nowrap">
                  <Code>{loan.tool.code}</Code>
                </span>{' '}
                {loan.tool.name}
              </Link>
              <span>{loan.holder.name} has it</span>
              <LateBadge daysLate={loan.daysLate} />
            </div>
            <ReminderButton loan={loan} />
          </li>
        ))}
      </ul>
      <AllLink to="/overdue" total={overdue.total} what="overdue loans" page="Overdue" />
    </Card>
  );
}

function OnLoan({ onLoan }: { onLoan: LeadTodayAnswer['onLoan'] }) {
  return (
    <Card title="Out on loan">
      {onLoan.toolCount === 0 ? (
        <p>No tool is out on loan.</p>
      ) : (
        <Link to="/loans" className={FIGURE_LINK}>
          <span className="font-mono text-2xl font-medium">{formatCents(onLoan.valueCents)}</span>
          <span className="underline underline-offset-4">in {formatQuantity(onLoan.toolCount, 'tool')} out on loan now</span>
        </Link>
      )}
    </Card>
  );
}

/** "next due in 5 days"; late: "7 days late", or "one 3 days late" among several. */
const dueWords = (p: LeadTodayAnswer['holders']['people'][number]) =>
  p.overdue ? `${p.toolCount > 1 ? 'one ' : ''}${p.firstDueWords}` : `next ${p.firstDueWords}`;

function Holders({ holders }: { holders: LeadTodayAnswer['holders'] }) {
  if (holders.total === 0) return <Card title="Who holds what"><p>Nobody holds a tool right now.</p></Card>;
  return (
    <Card title="Who holds what">
      <ul className="divide-y divide-rule">
        {holders.people.map((p) => (
          <li key={p.id}>
            <Link to="/loans" className="flex min-h-11 flex-wrap items-center justify-between gap-x-3 py-2">
              <span className="font-medium underline underline-offset-4">{p.name}</span>
              <span className={p.overdue ? 'font-semibold text-bad' : 'text-ink-soft'}>
                {formatQuantity(p.toolCount, 'tool')}, {dueWords(p)}
              </span>
            </Link>
          </li>
        ))}
      </ul>
      <AllLink to="/loans" total={holders.total} what="people holding tools" page="My loans" />
    </Card>
  );
}

function Reorder({ reorder }: { reorder: LeadTodayAnswer['reorder'] }) {
  return (
    <Card title="Reorder alerts">
      {reorder.toOrder === 0 ? (
        <p>No bin is waiting to be ordered.</p>
      ) : (
        <Link to="/alerts" className={FIGURE_LINK}>
          <span className="font-mono text-2xl font-medium">{formatCount(reorder.toOrder)}</span>
          <span className="underline underline-offset-4">{reorder.toOrder === 1 ? 'bin' : 'bins'} to order</span>
        </Link>
      )}
    </Card>
  );
}

function Requests({ requests }: { requests: LeadTodayAnswer['signoffRequests'] }) {
  return (
    <Card title="Sign-off requests">
      <SignoffRequestList requests={requests.requests} />
      {requests.total > 0 && <AllLink to="/signoffs" total={requests.total} what="sign-off requests" page="Sign-offs" />}
    </Card>
  );
}

function Spend({ spend }: { spend: LeadTodayAnswer['spend'] }) {
  return (
    <Card title="Consumables spend">
      <Link to="/spend" className={FIGURE_LINK}>
        <span className="font-mono text-2xl font-medium">{formatCents(spend.thisMonth.consumedCents)}</span>
        <span className="underline underline-offset-4">used in {monthName(spend.thisMonth.month)} so far</span>
        <span className="text-ink-soft">
          against {formatCents(spend.lastMonth.consumedCents)} in {monthName(spend.lastMonth.month)}
        </span>
      </Link>
    </Card>
  );
}

/** The lead's part of home: what needs them today, each figure a way to where it is dealt with. */
export function LeadToday() {
  // What the panels' buttons change refreshes them: a reminder and an answered request name the day panels.
  const { data } = useQuery(leadTodayQueryOptions());
  if (!data) return null;
  return (
    <div className="mb-4 grid gap-4 lg:grid-cols-2" data-testid="lead-today">
      <Overdue overdue={data.overdue} />
      <Requests requests={data.signoffRequests} />
      <OnLoan onLoan={data.onLoan} />
      <Holders holders={data.holders} />
      <Reorder reorder={data.reorder} />
      <Spend spend={data.spend} />
    </div>
  );
}
