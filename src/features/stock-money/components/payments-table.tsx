import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { PAYMENT_METHOD_LABELS } from '@shared/schemas/payment-methods';
import type { PaymentListItem } from '@shared/schemas/payments';
import { Button } from '@/components/ui/button';
import { DataTable, type ListFeatures } from '@/components/ui/data-table';
import { useListTable } from '@/components/ui/use-list-table';
import { formatCents, formatDateTime } from '@/lib/format';
import { RefundForm } from './refund-form';
import { Cents } from './tab-columns';

const helper = createColumnHelper<ListFeatures, PaymentListItem>();
const byCents = (pick: (p: PaymentListItem) => number) => (a: { original: PaymentListItem }, b: { original: PaymentListItem }) => pick(a.original) - pick(b.original);

const columns = helper.columns([
  helper.accessor('at', { header: 'When', sortFn: 'text', enableGlobalFilter: false, cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDateTime(getValue())}</span> }),
  helper.accessor((p) => p.member.name, { id: 'member', header: 'Member', sortFn: 'text', cell: ({ getValue }) => <span className="font-medium">{getValue()}</span> }),
  helper.accessor((p) => PAYMENT_METHOD_LABELS[p.method], { id: 'method', header: 'Method', sortFn: 'text' }),
  helper.accessor('amountCents', { header: 'Amount', sortFn: byCents((p) => p.amountCents), enableGlobalFilter: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
  helper.accessor('refundedCents', {
    header: 'Refunded',
    sortFn: byCents((p) => p.refundedCents),
    enableGlobalFilter: false,
    cell: ({ row }) =>
      row.original.refundedCents > 0 ? (
        <span className="whitespace-nowrap">
          <Cents cents={row.original.refundedCents} />
          {row.original.refundableCents > 0 && <span className="text-sm text-steel"> · {formatCents(row.original.refundableCents)} left</span>}
        </span>
      ) : (
        <span className="text-steel">None</span>
      ),
  }),
  helper.accessor((p) => p.recordedBy.name, { id: 'recordedBy', header: 'Recorded by', sortFn: 'text' }),
  helper.accessor('note', { header: 'Note', enableSorting: false }),
]);

/**
 * Cash and online payments together, newest first. The lead can refund what is left of an
 * online payment; the confirm step opens above the list.
 */
export function PaymentsTable({ payments, canRefund }: { payments: PaymentListItem[]; canRefund: boolean }) {
  const [refundingId, setRefundingId] = useState<number | null>(null);
  const refunding = payments.find((p) => p.id === refundingId && p.refundableCents > 0);
  const refundColumn = helper.display({
    id: 'refund',
    header: 'Refund',
    cell: ({ row }) =>
      row.original.refundableCents > 0 ? (
        <Button variant="secondary" onClick={() => setRefundingId(row.original.id)} aria-label={`Refund ${row.original.member.name}’s payment of ${formatCents(row.original.amountCents)}`}>
          Refund
        </Button>
      ) : null,
  });
  const list = useListTable({ columns: canRefund ? [...columns, refundColumn] : columns, data: payments, sort: { id: 'at', desc: true } });
  return (
    <div className="flex flex-col gap-3">
      {refunding && (
        <section aria-labelledby="refund-heading" className="rounded-xl border-2 border-bad bg-card p-4">
          <h2 id="refund-heading" className="mb-2 text-lg font-semibold">
            Refund {formatCents(refunding.refundableCents)} to {refunding.member.name}?
          </h2>
          <RefundForm key={refunding.id} payment={refunding} onClose={() => setRefundingId(null)} />
        </section>
      )}
      <DataTable table={list.table} caption="Payments, newest first" empty="No payments match these filters." />
    </div>
  );
}
