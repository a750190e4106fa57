import type { ReactNode } from 'react';
import { ScrollTable } from './scroll-table';

export interface FigureColumn<T> {
  header: string;
  cell: (row: T) => ReactNode;
  /** Figures sit right-aligned in the mono face, so their digits line up. */
  numeric?: boolean;
}

/**
 * A chart's figures as a plain table with a visible caption naming them: for screen readers, for
 * paper and for anyone who would rather read than look. Every row is there (no pages): on screen a
 * long table scrolls within about a chart's height (the region takes focus, so the keyboard scrolls it
 * too), and on paper it prints whole.
 */
export function FigureTable<T>({ caption, columns, rows, rowKey, empty }: { caption: string; columns: FigureColumn<T>[]; rows: T[]; rowKey: (row: T) => string; empty: string }) {
  return (
    <ScrollTable label={caption} className="max-h-[28rem] overflow-y-auto print:max-h-none print:overflow-visible">
      <table className="w-full border-collapse bg-card text-left text-sm">
        <caption className="px-3 pt-2 pb-1 text-left font-semibold">{caption}</caption>
        <thead className="sticky top-0 bg-paper">
          <tr>
            {columns.map((c) => (
              <th key={c.header} scope="col" className={`border-b border-rule px-3 py-2 font-semibold ${c.numeric ? 'text-right' : ''}`}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="px-3 py-2 text-steel">
                {empty}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={rowKey(row)} className="border-b border-rule last:border-b-0">
                {columns.map((c) => (
                  <td key={c.header} className={`px-3 py-1.5 align-baseline ${c.numeric ? 'text-right font-mono' : ''}`}>
                    {c.cell(row)}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </ScrollTable>
  );
}
