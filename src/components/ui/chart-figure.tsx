import type { ReactElement, ReactNode } from 'react';
import { ResponsiveContainer } from 'recharts';

/** What every chart's axes and grid are drawn in: the ink-soft text and the rule of src/index.css. */
export const CHART_TICK = { fill: '#3c4d5a', fontSize: 12 } as const;
export const CHART_GRID = '#d6d2c8';

/**
 * A chart as a picture with its caption: the drawing is one image to a screen reader, named by
 * `label`, and the caption says which figures it shows and where the same figures are as text.
 * Load it only from lazy pages: recharts is large.
 */
export function ChartFigure({ label, caption, children }: { label: string; caption: ReactNode; children: ReactElement }) {
  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <div role="img" aria-label={label} className="h-80 w-full print:h-64">
        <ResponsiveContainer width="100%" height="100%">
          {children}
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-steel">{caption}</figcaption>
    </figure>
  );
}

/**
 * A chart with the table of its figures: side by side on a wide screen (the chart stays in view
 * while a long table scrolls past), the table under it on a phone and on paper.
 */
export function ChartBesideTable({ chart, table }: { chart: ReactNode; table: ReactNode }) {
  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-2 lg:items-start print:grid-cols-1">
      <div className="min-w-0 lg:sticky lg:top-4 print:static">{chart}</div>
      <div className="min-w-0">{table}</div>
    </div>
  );
}
