import { useQuery } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import type { CheckoutStatus } from '@shared/schemas/payments';
import { formatCents } from '@/lib/format';
import { checkoutStatusQueryOptions } from '../api/get-checkout-status';

/** What My tab's address says about a trip to the hosted page: `?payment=paid&checkout=…` or `?payment=cancelled`. */
export interface PaymentReturnParams {
  outcome: 'paid' | 'cancelled';
  checkoutId?: string;
}

export function paymentReturnOf(search: URLSearchParams): PaymentReturnParams | undefined {
  const outcome = search.get('payment');
  if (outcome !== 'paid' && outcome !== 'cancelled') return undefined;
  return { outcome, checkoutId: search.get('checkout') ?? undefined };
}

const BOX = { wait: 'border-ink-soft bg-card', ok: 'border-ok bg-ok-soft', bad: 'border-bad bg-bad-soft' } as const;

function Message({ tone, title, children }: { tone: keyof typeof BOX; title: string; children?: ReactNode }) {
  return (
    <div className={`rounded-lg border-l-4 px-4 py-3 ${BOX[tone]}`}>
      <p className="font-semibold">{title}</p>
      {children && <p className="mt-1 text-sm leading-relaxed">{children}</p>}
    </div>
  );
}

function statusMessage(status: CheckoutStatus | undefined, failed: boolean): ReactNode {
  if (failed) return <Message tone="bad" title="This payment could not be found">Your tab below shows every payment recorded.</Message>;
  if (!status || status.state === 'open') {
    return <Message tone="wait" title="Still waiting for the provider">This page updates as soon as the provider confirms your payment.</Message>;
  }
  const amount = formatCents(status.amountCents, status.currency);
  if (status.state === 'paid') return <Message tone="ok" title={`Payment received: ${amount}`}>It is on your tab below, and a receipt is on its way by e-mail.</Message>;
  if (status.state === 'expired') return <Message tone="bad" title="This checkout expired: nothing was charged" />;
  return <Message tone="bad" title={`The provider’s payment did not match the ${amount} asked`}>Nothing came off your tab; ask the chapter lead about it.</Message>;
}

/** Asks after the checkout until it is settled either way; once paid, `onPaid` refreshes the tab. */
function CheckoutWatch({ checkoutId, onPaid }: { checkoutId: string; onPaid: () => void }) {
  const { data, isError } = useQuery(checkoutStatusQueryOptions(checkoutId));
  const paid = data?.state === 'paid';
  useEffect(() => {
    if (paid) onPaid();
  }, [paid, onPaid]);
  return statusMessage(data, isError);
}

/**
 * Back on My tab from the provider's page: what became of the payment, in one polite live region so
 * a screen reader hears "Payment received" when the provider's confirmation lands.
 */
export function PaymentReturn({ outcome, checkoutId, onPaid }: PaymentReturnParams & { onPaid: () => void }) {
  let message: ReactNode;
  if (outcome === 'cancelled') message = <Message tone="wait" title="Payment cancelled: nothing was charged." />;
  else if (checkoutId) message = <CheckoutWatch checkoutId={checkoutId} onPaid={onPaid} />;
  else message = statusMessage(undefined, false);
  return (
    <div role="status" aria-live="polite" className="mb-4">
      {message}
    </div>
  );
}
