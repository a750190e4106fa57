import { ALERT_STATE_LABELS, ALERT_STATES, type Alert } from '@shared/schemas/forecast';
import { Card } from '@/components/ui/page';
import type { AlertListState } from '../api/get-alerts';
import { AlertCard } from './alert-card';

const EMPTY: Record<AlertListState, string> = {
  active: 'No alert is waiting: every bin is above its reorder point and projected to stay above safety stock through its lead time.',
  closed: 'No order has been received against an alert yet.',
  dismissed: 'No alert has been dismissed.',
  all: 'No alert has been raised yet.',
};

const newestFirst = (a: Alert, b: Alert) => b.raisedAt.localeCompare(a.raisedAt);

/** Alerts grouped by state, those still to order first, newest first inside each group. */
export function AlertList({ alerts, filter }: { alerts: Alert[]; filter: AlertListState }) {
  if (alerts.length === 0) {
    return (
      <Card>
        <p>{EMPTY[filter]}</p>
      </Card>
    );
  }
  const groups = ALERT_STATES.map((state) => ({ state, items: alerts.filter((a) => a.state === state).sort(newestFirst) })).filter((g) => g.items.length > 0);
  return (
    <div className="flex flex-col gap-4">
      {groups.map(({ state, items }) => (
        <section key={state} aria-label={ALERT_STATE_LABELS[state]} className="rounded-xl border border-rule bg-card px-4 shadow-sm sm:px-5">
          <h2 className="border-b border-rule py-3 text-lg font-semibold">
            {ALERT_STATE_LABELS[state]} <span className="font-mono text-steel">({items.length})</span>
          </h2>
          <div className="divide-y divide-rule">
            {items.map((a) => (
              <AlertCard key={a.id} alert={a} />
            ))}
          </div>
        </section>
      ))}
    </div>
  );
}
