import { useMemo } from 'react';
import type { SpendMonth } from '@shared/schemas/stock-money';
import type { BinKind } from '@shared/stock/kinds';
import { DataTable } from '@/components/ui/data-table';
import { useListTable } from '@/components/ui/use-list-table';
import { dollars } from './format';
import { spendColumns } from './spend-columns';

/** The chart's figures as a table, newest month first, with the window's totals above it. */
export function SpendTable({ months, kinds }: { months: SpendMonth[]; kinds: BinKind[] }) {
  const columns = useMemo(() => spendColumns(kinds), [kinds]);
  const rows = useMemo(() => [...months].reverse(), [months]);
  const list = useListTable({ columns, data: rows, pageSize: 24 });
  const sum = (pick: (m: SpendMonth) => number) => months.reduce((s, m) => s + pick(m), 0);
  const shrink = sum((m) => m.countAdjustmentCents);
  return (
    <div className="flex flex-col gap-3">
      <p aria-live="polite">
        Over these {months.length} months the chapter used {dollars(sum((m) => m.consumedCents))} of consumables and bought {dollars(sum((m) => m.purchasedCents))}.{' '}
        {shrink < 0
          ? `Counts found ${dollars(-shrink)} of stock missing (kept apart from use).`
          : shrink > 0
            ? `Counts found ${dollars(shrink)} more stock than the ledger had (kept apart from use).`
            : 'Counts found the shelves matching the ledger.'}
      </p>
      <DataTable table={list.table} caption="Consumables by month" empty="No months to show." />
    </div>
  );
}
