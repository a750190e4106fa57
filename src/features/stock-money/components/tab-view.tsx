import type { ReactNode } from 'react';
import type { Tab } from '@shared/schemas/stock-money';
import { Card } from '@/components/ui/page';
import { dayOf, dollars } from './format';
import { RecentTabEntries, TabByAssembly, TabByMonth } from './tab-tables';
import { TabSummary } from './tab-summary';

function PaymentList({ tab }: { tab: Tab }) {
  if (tab.payments.length === 0) return <p className="text-steel">No payments recorded yet.</p>;
  return (
    <ul className="divide-y divide-rule">
      {tab.payments.map((p) => (
        <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-x-3 py-2">
          <span>
            {dayOf(p.at)}
            {p.note && <span className="text-steel"> · {p.note}</span>}
          </span>
          <span className="text-right">
            <span className="font-mono">{dollars(p.amountCents)}</span>
            {p.refundedCents > 0 && <span className="block text-sm text-steel">Refunded {dollars(p.refundedCents)}</span>}
          </span>
        </li>
      ))}
    </ul>
  );
}

/**
 * A member's tab: the balance, then what the page offers to do about it (`afterBalance`, e.g. paying
 * online), then where the money went (month, assembly, entry) and what was paid.
 */
export function TabView({ tab, afterBalance }: { tab: Tab; afterBalance?: ReactNode }) {
  return (
    <div className="flex flex-col gap-4">
      <TabSummary tab={tab} />
      {afterBalance}
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="By month">
          <TabByMonth tab={tab} />
        </Card>
        <Card title="By assembly">
          <TabByAssembly tab={tab} />
        </Card>
      </div>
      <Card title="Recent draws">
        <RecentTabEntries tab={tab} />
      </Card>
      <Card title="Payments">
        <PaymentList tab={tab} />
      </Card>
    </div>
  );
}
