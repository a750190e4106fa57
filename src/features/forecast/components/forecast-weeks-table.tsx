import type { BinForecastDto } from '@shared/schemas/forecast';
import { ScrollTable } from '@/components/ui/scroll-table';
import { formatDay, formatLevel } from '../utils/format';
import { receiptsByWeek } from '../utils/forecast-words';

/** The chart as a table: each week's demand, what is due in, and the projected on hand at its end. */
export function ForecastWeeksTable({ forecast, id }: { forecast: BinForecastDto; id?: string }) {
  const receipts = receiptsByWeek(forecast);
  const { reorderPoint, safetyStock } = forecast;
  return (
    <ScrollTable id={id} label={`${forecast.bin.code} week by week`}>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{forecast.bin.code} week by week</caption>
        <thead className="bg-paper">
          <tr>
            <th scope="col" className="px-2 py-2 sm:px-3 font-semibold">
              Week of
            </th>
            <th scope="col" className="px-2 py-2 sm:px-3 text-right font-semibold">
              Demand
            </th>
            <th scope="col" className="px-2 py-2 sm:px-3 text-right font-semibold">
              Due in
            </th>
            <th scope="col" className="px-2 py-2 sm:px-3 text-right font-semibold">
              Projected on hand
            </th>
          </tr>
        </thead>
        <tbody>
          {forecast.weeks.map((week, i) => {
            const projected = forecast.projected[i] ?? 0;
            const note =
              projected < 0
                ? { words: 'runs out', tone: 'text-bad' }
                : projected < safetyStock
                  ? { words: 'below safety stock', tone: 'text-bad' }
                  : projected <= reorderPoint
                    ? { words: 'at or below reorder point', tone: 'text-warn' }
                    : null;
            return (
              <tr key={week} className="border-t border-rule">
                <th scope="row" className="px-2 py-1.5 sm:px-3 font-normal whitespace-nowrap">
                  {formatDay(week)}
                </th>
                <td className="px-2 py-1.5 sm:px-3 text-right font-mono">{formatLevel(forecast.weeklyDemand[i] ?? 0)}</td>
                <td className="px-2 py-1.5 sm:px-3 text-right font-mono">{receipts[i] ? formatLevel(receipts[i]) : '—'}</td>
                <td className="px-2 py-1.5 sm:px-3 text-right">
                  <span className="font-mono">{formatLevel(projected)}</span>
                  {note && <span className={`block text-xs font-semibold ${note.tone}`}> {note.words}</span>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollTable>
  );
}
