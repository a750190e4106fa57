import { createColumnHelper } from '@tanstack/react-table';
import type { SpendMonth } from '@shared/schemas/stock-money';
import { BIN_KIND_LABELS, type BinKind } from '@shared/stock/kinds';
import type { ListFeatures } from '@/components/ui/data-table';
import { monthName } from './format';
import { KIND_COLOURS } from './kind-colours';
import { Cents } from './tab-columns';

const helper = createColumnHelper<ListFeatures, SpendMonth>();

/** A month's use per bin kind, each with its colour from the chart, or "Nothing used". */
export function UsedByKind({ month, kinds }: { month: SpendMonth; kinds: BinKind[] }) {
  const used = kinds.filter((k) => month.byKind[k] !== 0);
  if (used.length === 0) return <span className="text-steel">Nothing used</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {used.map((k) => (
        <li key={k} className="flex items-center gap-1.5 text-sm">
          <span aria-hidden className="size-3 shrink-0 rounded-sm" style={{ backgroundColor: KIND_COLOURS[k] }} />
          <span>{BIN_KIND_LABELS[k]}</span> <Cents cents={month.byKind[k]} />
        </li>
      ))}
    </ul>
  );
}

/** Month, use in total and per bin kind (the chart's bars in words), then purchases and count adjustments apart. */
export const spendColumns = (kinds: BinKind[]) =>
  helper.columns([
    helper.accessor('month', { header: 'Month', enableSorting: false, cell: ({ getValue }) => <span className="font-medium whitespace-nowrap">{monthName(getValue())}</span> }),
    helper.accessor('consumedCents', { header: 'Used', enableSorting: false, cell: ({ getValue }) => <strong><Cents cents={getValue()} /></strong> }),
    helper.display({ id: 'byKind', header: 'By kind', cell: ({ row }) => <UsedByKind month={row.original} kinds={kinds} /> }),
    helper.accessor('purchasedCents', { header: 'Bought', enableSorting: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
    helper.accessor('countAdjustmentCents', { header: 'Count adjustments', enableSorting: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
  ]);
