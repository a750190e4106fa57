import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from 'recharts';
import type { LoanWeek } from '@shared/schemas/loan-stats';
import { CATEGORY_LABELS, type ToolCategory } from '@shared/tools/categories';
import { CHART_GRID, CHART_TICK, ChartBesideTable, ChartFigure } from '@/components/ui/chart-figure';
import { FigureTable, type FigureColumn } from '@/components/ui/figure-table';
import { SwatchList } from '@/components/ui/swatch-list';
import { formatCount, formatDay, formatMonthDay } from '@/lib/format';
import { TOOL_KIND_COLOURS } from './tool-kind-colours';

const kindLabel = (key: unknown) => CATEGORY_LABELS[key as ToolCategory] ?? String(key);
const weekOf = (w: LoanWeek) => `Week of ${formatDay(w.start)}`;

/** Loans taken out each chapter week, stacked by tool kind, with the same figures in a table beside. */
export function LoansPerWeek({ weeks, kinds }: { weeks: LoanWeek[]; kinds: ToolCategory[] }) {
  const data = weeks.map((w) => ({ week: formatMonthDay(w.start), ...w.byKind }));
  const columns: FigureColumn<LoanWeek>[] = [
    { header: 'Week', cell: (w) => <span className="whitespace-nowrap">{weekOf(w)}</span> },
    {
      header: 'By kind',
      cell: (w) => (
        <SwatchList
          items={kinds.filter((k) => (w.byKind[k] ?? 0) > 0).map((k) => ({ key: k, colour: TOOL_KIND_COLOURS[k], label: CATEGORY_LABELS[k], value: <span className="font-mono">{formatCount(w.byKind[k] ?? 0)}</span> }))}
          empty="None lent"
        />
      ),
    },
    { header: 'Loans', numeric: true, cell: (w) => formatCount(w.total) },
  ];
  return (
    <ChartBesideTable
      chart={
        <ChartFigure
          label="Stacked bars of loans taken out each week by tool kind. The same figures are in the table beside."
          caption={`Loans taken out each week over the last ${formatCount(weeks.length)} weeks (weeks start on Monday), by tool kind.`}
        >
          <BarChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid vertical={false} stroke={CHART_GRID} />
            <XAxis dataKey="week" tick={CHART_TICK} tickLine={false} interval="preserveStartEnd" minTickGap={12} />
            <YAxis tick={CHART_TICK} allowDecimals={false} tickFormatter={(v: number) => formatCount(v)} width={40} />
            <Tooltip formatter={(value, name) => [formatCount(Number(value)), kindLabel(name)]} cursor={{ fill: '#f5f2ea' }} />
            <Legend itemSorter={null} formatter={(value) => <span className="text-sm text-ink">{kindLabel(value)}</span>} />
            {kinds.map((k) => (
              <Bar key={k} dataKey={k} name={k} stackId="loans" fill={TOOL_KIND_COLOURS[k]} isAnimationActive={false} />
            ))}
          </BarChart>
        </ChartFigure>
      }
      table={<FigureTable caption="Loans per week by tool kind" columns={columns} rows={[...weeks].reverse()} rowKey={(w) => w.start} empty="No weeks to show." />}
    />
  );
}
