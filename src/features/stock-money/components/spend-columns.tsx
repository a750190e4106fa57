import { createColumnHelper } from '@tanstack/react-table';
import type { SpendMonth } from '@shared/schemas/stock-money';
import { BIN_KIND_LABELS, type BinKind } from '@shared/stock/kinds';
import type { ListFeatures } from '@/components/ui/data-table';
import { SwatchList } from '@/components/ui/swatch-list';
import { monthName } from './format';
import { KIND_COLOURS } from './kind-colours';
import { Cents } from './tab-columns';

const helper = createColumnHelper<ListFeatures, SpendMonth>();

/** A month's use per bin kind, each with its colour from the chart, or "Nothing used". */
export function UsedByKind({ month, kinds }: { month: SpendMonth; kinds: BinKind[] }) {
  const used = kinds.filter((k) => month.byKind[k] !== 0);
  return <SwatchList items={used.map((k) => ({ key: k, colour: KIND_COLOURS[k], label: BIN_KIND_LABELS[k], value: <Cents cents={month.byKind[k]} /> }))} empty="Nothing used" />;
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
