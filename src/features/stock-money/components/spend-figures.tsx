import type { SpendMonth } from '@shared/schemas/stock-money';
import type { BinKind } from '@shared/stock/kinds';
import { FigureTable } from '@/components/ui/figure-table';
import { monthName } from './format';
import { UsedByKind } from './spend-columns';
import { Cents } from './tab-columns';

/** The spend chart's own figures (use per month and bin kind), newest month first: the table beside the chart. */
export function SpendFigures({ months, kinds }: { months: SpendMonth[]; kinds: BinKind[] }) {
  return (
    <FigureTable
      caption="Consumables used per month by bin kind"
      columns={[
        { header: 'Month', cell: (m) => <span className="font-medium whitespace-nowrap">{monthName(m.month)}</span> },
        { header: 'By kind', cell: (m) => <UsedByKind month={m} kinds={kinds} /> },
        { header: 'Used', numeric: true, cell: (m) => <Cents cents={m.consumedCents} /> },
      ]}
      rows={[...months].reverse()}
      rowKey={(m) => m.month}
      empty="No months to show."
    />
  );
}
