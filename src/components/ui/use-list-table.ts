import { useTable, type ColumnSort, type RowData, type TableOptions } from '@tanstack/react-table';
import type { ChangeEvent } from 'react';
import { columnFilter, listFeatures, type ListFeatures } from './data-table';

export interface ListTableOptions<T extends RowData> {
  columns: TableOptions<ListFeatures, T>['columns'];
  data: T[];
  /** The column the list opens sorted by; none keeps the data's own order. */
  sort?: ColumnSort;
  pageSize?: number;
}

/**
 * The table behind a Gripline list: sort, column filters, a search over every searchable column,
 * and pages (25 rows unless told). The state lives in the table, as before: leaving the page
 * forgets it. Render it with `<DataTable table={list.table} …>`.
 */
export function useListTable<T extends RowData>({ columns, data, sort, pageSize = 25 }: ListTableOptions<T>) {
  const table = useTable({
    features: listFeatures,
    columns,
    data,
    globalFilterFn: 'includesString',
    initialState: { sorting: sort ? [sort] : [], pagination: { pageIndex: 0, pageSize } },
  });
  return {
    table,
    /** Spread on a TextField: the list's search box. */
    searchProps: {
      type: 'search',
      value: String(table.state.globalFilter ?? ''),
      onChange: (e: ChangeEvent<HTMLInputElement>) => table.setGlobalFilter(e.target.value),
    },
    /** A column's filter as a select box sees it: '' means no filter. */
    filter: (id: string) => columnFilter(table, id),
    /** How many rows pass the search and the filters (on every page). */
    shown: table.getFilteredRowModel().rows.length,
  };
}
