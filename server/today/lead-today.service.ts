import { LEAD_TODAY_LIST_MAX, type HolderSummary, type LeadToday } from '@shared/schemas/today-lead';
import type { Loan } from '@shared/schemas/tools';
import { dueState } from '@shared/time/chapter-time';
import type { ServiceContext } from '../context';
import { listAlerts } from '../features/planning/alerts.repo';
import { chapterSpend } from '../features/stock/money.service';
import { listLoans, openLoanValue } from '../features/tools/loan-history.repo';
import { listOverdue } from '../features/tools/overdue.service';
import { openSignoffRequests } from '../features/tools/signoff-requests.service';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/** Who holds what (the open loans screen's list), one line a person: most tools first, then the first due. */
function holdersOf(open: Loan[], now: Date, zone: string): HolderSummary[] {
  const byPerson = new Map<number, Loan[]>();
  for (const loan of open) byPerson.set(loan.holder.id, [...(byPerson.get(loan.holder.id) ?? []), loan]);
  return [...byPerson.values()]
    .map((loans) => {
      // Open loans come soonest due first.
      const first = loans[0]!;
      const due = dueState(new Date(first.dueAt), now, zone);
      return { id: first.holder.id, name: first.holder.name, toolCount: loans.length, firstDueAt: first.dueAt, firstDueWords: due.words, overdue: due.overdue };
    })
    .sort((a, b) => b.toolCount - a.toolCount || a.firstDueAt.localeCompare(b.firstDueAt) || a.name.localeCompare(b.name));
}

/** What needs a chapter lead today, each figure from the function behind its own screen. Reads only. */
export function leadToday(ctx: ServiceContext): LeadToday {
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);
  const overdue = listOverdue(ctx).data;
  const holders = holdersOf(listLoans(ctx.db, { open: true }), now, zone);
  const requests = openSignoffRequests(ctx);
  const [lastMonth, thisMonth] = chapterSpend(ctx, 2).months.map(({ month, consumedCents }) => ({ month, consumedCents }));
  return {
    overdue: { total: overdue.length, loans: overdue.slice(0, LEAD_TODAY_LIST_MAX) },
    onLoan: openLoanValue(ctx.db),
    holders: { total: holders.length, people: holders.slice(0, LEAD_TODAY_LIST_MAX) },
    reorder: { toOrder: listAlerts(ctx.db, ['open']).length },
    signoffRequests: { total: requests.length, requests: requests.slice(0, LEAD_TODAY_LIST_MAX) },
    spend: { thisMonth: thisMonth!, lastMonth: lastMonth! },
  };
}
