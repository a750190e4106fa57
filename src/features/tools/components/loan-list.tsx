import { Link } from 'react-router';
import type { Loan } from '@shared/schemas/tools';
import { formatDate, formatDateTime, formatDueDay } from '@/lib/format';
import { DueBadge } from './due-badge';
import { ItemCode } from '@/components/ui/page';

/** Open loans, soonest due first, each with due words (and colour) and the accessories that went out with it, to bring back. */
export function OpenLoanList({ loans, showHolder = false, empty }: { loans: Loan[]; showHolder?: boolean; empty: string }) {
  if (loans.length === 0) return <p className="text-steel">{empty}</p>;
  return (
    <ul className="flex flex-col gap-2">
      {loans.map((l) => (
        <li key={l.id} className="rounded-lg border border-rule bg-card p-3">
          <Link to={`/tools/${l.tool.code}`} className="flex min-h-11 flex-col">
            <ItemCode code={l.tool.code} className="text-sm font-medium text-brass-deep" />
            <span className="font-semibold underline-offset-4 hover:underline">{l.tool.name}</span>
          </Link>
          <div className="mt-1 flex flex-wrap items-center gap-2 text-sm">
            {showHolder && <span className="font-medium">{l.holder.name}</span>}
            <span>back by {formatDueDay(l.dueAt)}</span>
            <DueBadge dueAt={l.dueAt} />
          </div>
          {l.accessoriesOut && l.accessoriesOut.length > 0 && <p className="mt-1 text-sm text-steel">With: {l.accessoriesOut.join(', ')}</p>}
        </li>
      ))}
    </ul>
  );
}

export function LoanHistoryList({ loans }: { loans: Loan[] }) {
  if (loans.length === 0) return <p className="text-steel">No returned tools yet.</p>;
  return (
    <ul className="divide-y divide-rule">
      {loans.map((l) => (
        <li key={l.id} className="py-2">
          <Link to={`/tools/${l.tool.code}`} className="inline-flex min-h-11 items-center gap-1 font-medium underline-offset-4 hover:underline">
            <ItemCode code={l.tool.code} /> {l.tool.name}
          </Link>
          <p className="text-sm text-steel">
            {formatDate(l.checkedOutAt)} – {l.returnedAt ? formatDateTime(l.returnedAt) : ''}
            {l.returnCondition === 'needs_attention' ? ' · reported: needs attention' : ''}
            {l.shortfall ? ` · ${l.shortfall} temporary fasteners short` : ''}
            {l.accessoriesMissing.length > 0 ? ` · did not come back: ${l.accessoriesMissing.join(', ')}` : ''}
          </p>
        </li>
      ))}
    </ul>
  );
}
