import { useId, useState } from 'react';
import { toast } from 'sonner';
import { Link } from 'react-router';
import type { Alert } from '@shared/schemas/forecast';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useCloseAlert } from '../api/alert-actions';
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
      const sofar = alert.receivedQty > 0 && alert.state === 'ordered' ? ` ${formatQuantity(alert.receivedQty, u)} received so far, ${formatQuantity(alert.onOrder, u)} still to come.` : '';
      const closed = alert.state === 'closed' && alert.closedAt ? closedWords(alert, formatDay(alert.closedAt)) : '';
      return `${ordered}${when}${who}${expected}.${sofar}${closed}`;
    }
    case 'dismissed':
      return `Dismissed${alert.dismissedAt ? ` on ${formatDay(alert.dismissedAt)}` : ''}: ${alert.dismissReason ?? 'no reason given'}`;
    default:
      return null;
  }
}

/** A closed order: all of it came, or the quartermaster closed it with part (or none) received. */
function closedWords(alert: Alert, day: string): string {
  const u = alert.bin.unit;
  if (alert.orderedQty === null || alert.receivedQty >= alert.orderedQty) return ` Received on ${day}.`;
  return ` Closed on ${day} with ${formatQuantity(alert.receivedQty, u)} of ${formatQuantity(alert.orderedQty, u)} received.`;
}

type Open = 'none' | 'ordered' | 'dismiss';

/** One alert: the bin, the levels it was raised against, what to order now (the one reorder rule, as on Restock), and what the quartermaster can do with it. */
export function AlertCard({ alert }: { alert: Alert }) {
  const { bin } = alert;
  const headingId = useId();
  const [open, setOpen] = useState<Open>('none');
  const u = bin.unit;
  const history = historyWords(alert);
  const close = () => setOpen('none');
  const closeOrder = useCloseAlert();
  const closeByHand = () =>
    closeOrder.mutate({ id: alert.id }, { onSuccess: () => toast.success(`${bin.code}: order closed; nothing more is on order.`) });
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
        {alert.state === 'ordered' ? (
          <Figure label="On order" value={formatQuantity(alert.onOrder, u)} extra={alert.toOrder > 0 ? `order ${formatQuantity(alert.toOrder, u)} more` : undefined} />
        ) : alert.state === 'open' ? (
          <Figure label="Order now" value={formatQuantity(alert.toOrder, u)} extra={packWords(alert.toOrder, bin.packSize)} />
        ) : (
          <Figure label="Suggested when raised" value={formatQuantity(alert.suggestedQty, u)} extra={packWords(alert.suggestedQty, bin.packSize)} />
        )}
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
          {alert.state === 'ordered' && alert.toOrder > 0 && (
            <Button onClick={() => setOpen('ordered')} aria-label={`Order more for ${bin.code}: ${formatQuantity(alert.toOrder, u)} on top of what is on order`}>
              Order more
            </Button>
          )}
          {alert.state === 'ordered' && (
            <Button variant="secondary" onClick={closeByHand} busy={closeOrder.isPending} aria-label={`Close order for ${bin.code}: the rest will not come`}>
              Close order
            </Button>
          )}
          <Button variant="secondary" onClick={() => setOpen('dismiss')}>
            Dismiss
          </Button>
        </div>
      )}
      {closeOrder.isError && <Notice tone="bad">{messageOf(closeOrder.error)}</Notice>}
      {open === 'ordered' && <MarkOrderedForm alert={alert} onDone={close} />}
      {open === 'dismiss' && <DismissForm alert={alert} onDone={close} />}
    </article>
  );
}
