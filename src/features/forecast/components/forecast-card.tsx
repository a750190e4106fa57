import { useId, useState } from 'react';
import { Link } from 'react-router';
import type { BinForecastDto } from '@shared/schemas/forecast';
import { asSentence, formatQuantity } from '../utils/format';
import { forecastSentences, statusWords } from '../utils/forecast-words';
import { useSeenOnce } from '../utils/in-view';
import { Figure } from './figure';
import { ForecastChart, ForecastLegend } from './forecast-chart';
import { ForecastWeeksTable } from './forecast-weeks-table';

/** One bin: its status in words, the key levels, a small chart drawn when it scrolls into view, the figures in sentences and a week table. */
export function ForecastCard({ forecast, serviceLevel }: { forecast: BinForecastDto; serviceLevel: number }) {
  const { bin } = forecast;
  const headingId = useId();
  const tableId = useId();
  const [showWeeks, setShowWeeks] = useState(false);
  const { ref, seen } = useSeenOnce<HTMLDivElement>();
  const u = bin.unit;
  return (
    <article aria-labelledby={headingId} className="flex flex-col gap-3 rounded-xl border border-rule bg-card p-4 shadow-sm sm:p-5">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <h2 id={headingId} className="flex min-w-0 flex-col">
          <Link to={`/bins/${bin.code}`} className="inline-flex min-h-12 items-center self-start font-mono text-lg font-semibold underline underline-offset-4">
            {bin.code}
          </Link>
          <span className="font-medium">{bin.designation}</span>
        </h2>
        <p
          className={`rounded-full border-2 px-3 py-1 text-sm font-semibold ${forecast.needsAlert ? 'border-warn bg-warn-soft text-warn' : 'border-ok bg-ok-soft text-ok'}`}
        >
          {statusWords(forecast)}
        </p>
      </header>
      <p>{asSentence(forecast.reason)}</p>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Figure label="On hand" value={formatQuantity(bin.onHand, u)} />
        <Figure label="Reorder point" value={formatQuantity(forecast.reorderPoint, u)} />
        <Figure label="Safety stock" value={formatQuantity(forecast.safetyStock, u)} />
        <Figure label="Suggested order" value={formatQuantity(forecast.suggestedOrder, u)} />
      </dl>
      <figure className="flex flex-col gap-2">
        <div ref={ref} role="img" aria-label={`Chart of ${bin.code}'s projected on hand over ${forecast.weeks.length} weeks against its reorder point and safety stock. The figures are in the text and the week table.`} className="h-44 w-full sm:h-56">
          {seen && <ForecastChart forecast={forecast} />}
        </div>
        <figcaption>
          <ForecastLegend />
        </figcaption>
      </figure>
      <ul aria-label="In words" className="flex list-disc flex-col gap-1 pl-5 text-sm leading-relaxed">
        {forecastSentences(forecast, serviceLevel).map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
      <button
        type="button"
        aria-expanded={showWeeks}
        aria-controls={tableId}
        onClick={() => setShowWeeks((v) => !v)}
        className="inline-flex min-h-12 items-center self-start font-semibold underline underline-offset-4"
      >
        Week by week
        <span aria-hidden className="ml-2 font-mono text-steel">
          {showWeeks ? '▴' : '▾'}
        </span>
      </button>
      {showWeeks && <ForecastWeeksTable forecast={forecast} id={tableId} />}
    </article>
  );
}
