import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from 'recharts';
import type { LoanWeek } from '@shared/schemas/loan-stats';
import { dayCount } from '@shared/time/words';
import { CHART_GRID, CHART_TICK, ChartBesideTable, ChartFigure } from '@/components/ui/chart-figure';
import { FigureTable } from '@/components/ui/figure-table';
import { formatCount, formatDay, formatMonthDay } from '@/lib/format';

/** For each chapter week, the days loans spent overdue in it (as the Overdue page counts days late), with a table beside. */
export function OverdueDaysPerWeek({ weeks }: { weeks: LoanWeek[] }) {
  const data = weeks.map((w) => ({ week: formatMonthDay(w.start), overdueDays: w.overdueDays }));
  return (
    <ChartBesideTable
      chart={
        <ChartFigure
          label="Bars of the days loans were overdue each week. The same figures are in the table beside."
          caption="Days overdue each week: for every loan past its due day, the days of that week it was late, added up."
        >
          <BarChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid vertical={false} stroke={CHART_GRID} />
            <XAxis dataKey="week" tick={CHART_TICK} tickLine={false} interval="preserveStartEnd" minTickGap={12} />
            <YAxis tick={CHART_TICK} allowDecimals={false} tickFormatter={(v: number) => formatCount(v)} width={40} />
            <Tooltip formatter={(value) => [dayCount(Number(value)), 'Overdue']} cursor={{ fill: '#f5f2ea' }} />
            <Bar dataKey="overdueDays" name="Days overdue" fill="#a2281b" isAnimationActive={false} />
          </BarChart>
        </ChartFigure>
      }
      table={
        <FigureTable
          caption="Days overdue per week"
          columns={[
            { header: 'Week', cell: (w) => <span className="whitespace-nowrap">Week of {formatDay(w.start)}</span> },
            { header: 'Days overdue', numeric: true, cell: (w) => formatCount(w.overdueDays) },
          ]}
          rows={[...weeks].reverse()}
          rowKey={(w) => w.start}
          empty="No weeks to show."
        />
      }
    />
  );
}
