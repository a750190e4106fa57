import type { RowData } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { DataTable } from './data-table';
import type { useListTable } from './use-list-table';

type ListTable<T extends RowData> = ReturnType<typeof useListTable<T>>;

/** A list's filters, folded away until one is on; the summary says how many are on. */
export function FilterPanel({ summary, active, children }: { summary: string; active: number; children: ReactNode }) {
  return (
    <details className="rounded-lg border border-rule bg-card px-3" open={active > 0 || undefined}>
      <summary className="flex min-h-12 cursor-pointer items-center font-semibold">
        {summary}
        {active > 0 ? ` (${active} on)` : ''}
      </summary>
      <div className="grid gap-3 pb-3 sm:grid-cols-3">{children}</div>
    </details>
  );
}

/** How many of the list's rows pass its search and filters, then the table of them. */
export function FilteredTable<T extends RowData>({ list, total, noun, caption, empty }: { list: ListTable<T>; total: number; noun: string; caption: string; empty: string }) {
  return (
    <>
      <p className="text-sm text-steel" aria-live="polite">
        Showing {list.shown} of {total} {noun}
      </p>
      <DataTable table={list.table} caption={caption} empty={empty} />
    </>
  );
}
