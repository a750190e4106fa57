import { useId, useState } from 'react';
import { Link } from 'react-router';
import type { Alert } from '@shared/schemas/forecast';
import { Button } from '@/components/ui/button';
import { asSentence, formatDay, formatQuantity, packWords } from '../utils/format';
import { AlertStateBadge } from './alert-state-badge';
import { DismissForm } from './dismiss-form';
import { Figure } from './figure';
import { MarkOrderedForm } from './mark-ordered-form';

/** What happened to the alert after it was raised, in a sentence. */
function historyWords(alert: Alert): string | null {
  const u = alert.bin.unit;
  switch (alert.state) {
    case 'ordered':
    case 'closed': {
      const ordered = alert.orderedQty !== null ? `Ordered ${formatQuantity(alert.orderedQty, u)}` : 'Ordered';
      const when = alert.orderedAt ? ` on ${formatDay(alert.orderedAt)}` : '';
      const who = alert.orderedBy ? ` by ${alert.orderedBy.name}` : '';
      const expected = alert.expectedAt ? `, expected by ${formatDay(alert.expectedAt)}` : '';
      const received = alert.state === 'closed' && alert.closedAt ? ` Received on ${formatDay(alert.closedAt)}.` : '';
      return `${ordered}${when}${who}${expected}.${received}`;
    }
    case 'dismissed':
      return `Dismissed${alert.dismissedAt ? ` on ${formatDay(alert.dismissedAt)}` : ''}: ${alert.dismissReason ?? 'no reason given'}`;
    default:
      return null;
  }
}

type Open = 'none' | 'ordered' | 'dismiss';

/** One alert: the bin, the levels it was raised against, the suggested order, and what the quartermaster can do with it. */
export function AlertCard({ alert }: { alert: Alert }) {
  const { bin } = alert;
  const headingId = useId();
  const [open, setOpen] = useState<Open>('none');
  const u = bin.unit;
  const history = historyWords(alert);
  const close = () => setOpen('none');
  return (
    <article aria-labelledby={headingId} className="flex flex-col gap-3 py-4">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <h3 id={headingId} className="flex min-w-0 flex-col">
          <Link to={`/bins/${bin.code}`} className="inline-flex min-h-12 items-center self-start font-mono text-lg font-semibold underline underline-offset-4">
            {bin.code}
          </Link>
          <span className="font-medium">{bin.designation}</span>
        </h3>
        <AlertStateBadge state={alert.state} />
      </header>
      <p>
        <span className="text-steel">Raised {formatDay(alert.raisedAt)}: </span>
        {asSentence(alert.reason)}
      </p>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Figure label="On hand when raised" value={formatQuantity(alert.onHandAtRaise, u)} />
        <Figure label="Reorder point" value={formatQuantity(alert.reorderPoint, u)} />
        <Figure label="Safety stock" value={formatQuantity(alert.safetyStock, u)} />
        <Figure label="Suggested order" value={formatQuantity(alert.suggestedQty, u)} extra={packWords(alert.suggestedQty, bin.packSize)} />
      </dl>
      <p className="text-sm">
        {bin.supplier ? (
          <>
            Supplier <span className="font-semibold">{bin.supplier}</span>
            {bin.supplierPart && (
              <>
                , part <span className="font-mono">{bin.supplierPart}</span>
              </>
            )}
          </>
        ) : (
          'No supplier set for this bin.'
        )}
      </p>
      {history && <p className="text-sm">{history}</p>}
      {/* An order that fell through can be dismissed too; a received alert is closed for good. */}
      {(alert.state === 'open' || alert.state === 'ordered') && open === 'none' && (
        <div className="flex flex-wrap gap-2">
          {alert.state === 'open' && <Button onClick={() => setOpen('ordered')}>Mark ordered</Button>}
          <Button variant="secondary" onClick={() => setOpen('dismiss')}>
            Dismiss
          </Button>
        </div>
      )}
      {open === 'ordered' && <MarkOrderedForm alert={alert} onDone={close} />}
      {open === 'dismiss' && <DismissForm alert={alert} onDone={close} />}
    </article>
  );
}
