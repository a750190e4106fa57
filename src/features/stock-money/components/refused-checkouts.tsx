import type { RefusedCheckout } from '@shared/schemas/payments';
import { formatCents, formatDateTime } from '@/lib/format';

/** What the provider reported for a refused checkout, in its own currency. */
const reported = (r: RefusedCheckout) => (r.receivedCents === null ? 'the provider reported no amount' : `the provider reported ${formatCents(r.receivedCents, r.receivedCurrency ?? r.currency)}`);

/**
 * Online checkouts whose completion was refused: the provider took another amount or currency
 * than the one asked, so the money is on no tab until the lead settles it with the member.
 * Shown only when there are any.
 */
export function RefusedCheckouts({ refused }: { refused: RefusedCheckout[] }) {
  if (refused.length === 0) return null;
  return (
    <section aria-labelledby="refused-checkouts-heading" className="rounded-xl border-2 border-warn bg-warn-soft p-4 sm:p-5">
      <h2 id="refused-checkouts-heading" className="mb-2 text-lg font-semibold">
        Checkouts refused
      </h2>
      <p className="mb-3 text-sm">
        The provider reported another amount than the checkout asked, so nothing went on the member’s tab. Settle it with the member: refund it in the provider’s dashboard or record the payment by hand.
      </p>
      <ul className="flex flex-col gap-1">
        {refused.map((r) => (
          <li key={r.id}>
            <span className="font-medium">{r.member.name}</span>: asked {formatCents(r.askedCents, r.currency)}, {reported(r)} <span className="text-sm">· {formatDateTime(r.at)}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
