import { Area, Bar, CartesianGrid, ComposedChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { BinForecastDto } from '@shared/schemas/forecast';
import { formatLevel, formatWeek } from '../utils/format';
import { receiptsByWeek } from '../utils/forecast-words';
import { FORECAST_COLOURS as C } from './forecast-colours';

const SERIES_NAMES: Record<string, string> = { projected: 'Projected on hand', receipt: 'Expected receipt' };

/**
 * Projected on hand at the end of each week against the reorder point and safety stock, with
 * expected receipts as bars. A picture only: the sentences and the week table carry the figures.
 */
export function ForecastChart({ forecast }: { forecast: BinForecastDto }) {
  const receipts = receiptsByWeek(forecast);
  const data = forecast.weeks.map((week, i) => ({ week: formatWeek(week), projected: forecast.projected[i], receipt: receipts[i] || null }));
  return (
    <ResponsiveContainer width="100%" height="100%">
      <ComposedChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
        <CartesianGrid vertical={false} stroke={C.grid} />
        <XAxis dataKey="week" tick={{ fill: C.axis, fontSize: 11 }} tickLine={false} interval="preserveStartEnd" minTickGap={24} />
        <YAxis tick={{ fill: C.axis, fontSize: 11 }} tickFormatter={(v: number) => formatLevel(v)} width={48} allowDecimals={false} />
        <Tooltip formatter={(value, name) => [formatLevel(Number(value)), SERIES_NAMES[String(name)] ?? String(name)]} cursor={{ stroke: C.zero }} />
        <ReferenceLine y={0} stroke={C.zero} />
        <Area
          type="stepAfter"
          dataKey="projected"
          name="projected"
          stroke={C.projected}
          strokeWidth={2}
          fill={C.projectedFill}
          fillOpacity={0.35}
          isAnimationActive={false}
        />
        <Bar dataKey="receipt" name="receipt" fill={C.receipt} barSize={8} isAnimationActive={false} />
        <ReferenceLine y={forecast.reorderPoint} stroke={C.reorderPoint} strokeWidth={2} strokeDasharray="8 4" ifOverflow="extendDomain" />
        <ReferenceLine y={forecast.safetyStock} stroke={C.safetyStock} strokeWidth={2} strokeDasharray="2 3" ifOverflow="extendDomain" />
      </ComposedChart>
    </ResponsiveContainer>
  );
}

/** The chart's key, in words beside each swatch; the line styles differ as well as the colours. */
export function ForecastLegend() {
  const item = 'inline-flex items-center gap-2';
  return (
    <ul aria-label="Chart key" className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
      <li className={item}>
        <span aria-hidden className="inline-block h-3 w-5 rounded-sm border-2" style={{ borderColor: C.projected, background: C.projectedFill }} />
        Projected on hand
      </li>
      <li className={item}>
        <span aria-hidden className="inline-block w-5 border-t-2 border-dashed" style={{ borderColor: C.reorderPoint }} />
        Reorder point
      </li>
      <li className={item}>
        <span aria-hidden className="inline-block w-5 border-t-2 border-dotted" style={{ borderColor: C.safetyStock }} />
        Safety stock
      </li>
      <li className={item}>
        <span aria-hidden className="inline-block h-3 w-2" style={{ background: C.receipt }} />
        Expected receipt
      </li>
    </ul>
  );
}
