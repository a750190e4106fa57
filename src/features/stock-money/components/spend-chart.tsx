import { Bar, BarChart, CartesianGrid, Legend, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { SpendMonth } from '@shared/schemas/stock-money';
import { BIN_KIND_LABELS, type BinKind } from '@shared/stock/kinds';
import { CHART_GRID, CHART_TICK, ChartFigure } from '@/components/ui/chart-figure';
import { dollars, monthShort } from './format';
import { moneyAxis } from '../utils/money-axis';
import { KIND_COLOURS } from './kind-colours';

const wholeDollars = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD', maximumFractionDigits: 0 });
const label = (key: unknown) => BIN_KIND_LABELS[key as BinKind] ?? String(key);

/**
 * Consumables used per month, stacked by bin kind, in dollars. A month where more came back than
 * went out stacks below zero. The chart is a picture; SpendTable carries the same figures as text.
 */
export function SpendChart({ months, kinds }: { months: SpendMonth[]; kinds: BinKind[] }) {
  const data = months.map((m) => ({ month: monthShort(m.month), ...Object.fromEntries(kinds.map((k) => [k, m.byKind[k] / 100])) }));
  const axis = moneyAxis(months, kinds);
  return (
    <ChartFigure
      label="Stacked bars of consumables used each month by bin kind. The same figures are in the table."
      caption="Consumables used per month by bin kind: draws and write-offs, less returns. The table has the figures."
    >
      <BarChart data={data} stackOffset="sign" accessibilityLayer={false} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
        <CartesianGrid vertical={false} stroke={CHART_GRID} />
        <XAxis dataKey="month" tick={CHART_TICK} tickLine={false} interval="preserveStartEnd" />
        <YAxis domain={axis.domain} ticks={axis.ticks} allowDataOverflow tick={CHART_TICK} tickFormatter={(v: number) => wholeDollars.format(v)} width={56} />
        <ReferenceLine y={0} stroke="#6b7d8a" />
        <Tooltip formatter={(value, name) => [dollars(Math.round(Number(value) * 100)), label(name)]} cursor={{ fill: '#f5f2ea' }} />
        <Legend itemSorter={null} formatter={(value) => <span className="text-sm text-ink">{label(value)}</span>} />
        {kinds.map((k) => (
          <Bar key={k} dataKey={k} name={k} stackId="used" fill={KIND_COLOURS[k]} isAnimationActive={false} />
        ))}
      </BarChart>
    </ChartFigure>
  );
}
