import {
  columnFilteringFeature,
  createFilteredRowModel,
  createPaginatedRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  filterFn_includesString,
  globalFilteringFeature,
  rowPaginationFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_datetime,
  sortFn_text,
  tableFeatures,
  type ReactTable,
  type RowData,
} from '@tanstack/react-table';

/** The features every Gripline list uses: sort, column filters, a search box, pages. */
export const listFeatures = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  rowPaginationFeature,
  filteredRowModel: createFilteredRowModel(),
  sortedRowModel: createSortedRowModel(),
  paginatedRowModel: createPaginatedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, text: sortFn_text, datetime: sortFn_datetime },
  filterFns: { includesString: filterFn_includesString, equalsString: filterFn_equalsString },
});
export type ListFeatures = typeof listFeatures;

const SORT_WORDS = { asc: 'ascending', desc: 'descending' } as const;

/**
 * Table markup for a list: sortable headers as buttons, an empty state and page controls.
 * On a phone each row becomes a card with the column names beside the values, and the
 * headers stay as a row of sort buttons.
 */
export function DataTable<T extends RowData>({ table, caption, empty }: { table: ReactTable<ListFeatures, T>; caption: string; empty: string }) {
  const rows = table.getRowModel().rows;
  const pageCount = table.getPageCount();
  const { pageIndex } = table.state.pagination;
  return (
    <div className="rounded-xl border border-rule bg-card sm:overflow-x-auto">
      <table className="w-full border-collapse text-left max-sm:block">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper max-sm:block max-sm:border-b max-sm:border-rule">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="max-sm:flex max-sm:flex-wrap max-sm:gap-x-3 max-sm:px-2">
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted ? SORT_WORDS[sorted] : undefined}
                    className={`border-rule px-3 py-2 text-sm font-semibold whitespace-nowrap sm:border-b max-sm:px-1 max-sm:py-0 ${header.column.getCanSort() ? '' : 'max-sm:hidden'}`}
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 min-w-11 items-center gap-1 underline-offset-4 hover:underline"
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden className="font-mono text-steel">
                          {sorted === 'asc' ? '↑' : sorted === 'desc' ? '↓' : '↕'}
                        </span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="max-sm:block">
          {rows.length === 0 ? (
            <tr>
              <td colSpan={table.getAllLeafColumns().length} className="px-3 py-6 text-center text-steel">
                {empty}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.id} className="border-b border-rule last:border-b-0 max-sm:block max-sm:py-2">
                {row.getAllCells().map((cell) => (
                  <td
                    key={cell.id}
                    data-label={typeof cell.column.columnDef.header === 'string' ? cell.column.columnDef.header : undefined}
                    className="px-3 py-2 align-middle max-sm:flex max-sm:items-center max-sm:gap-3 max-sm:py-1 max-sm:before:w-16 max-sm:before:shrink-0 max-sm:before:text-sm max-sm:before:text-steel max-sm:before:content-[attr(data-label)]"
                  >
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
      {pageCount > 1 && (
        <nav aria-label={`${caption} pages`} className="flex items-center justify-between gap-2 border-t border-rule px-3 py-2">
          <button type="button" className="min-h-11 px-3 underline disabled:text-steel disabled:no-underline" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous
          </button>
          <span className="text-sm">
            Page {pageIndex + 1} of {pageCount}
          </span>
          <button type="button" className="min-h-11 px-3 underline disabled:text-steel disabled:no-underline" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next
          </button>
        </nav>
      )}
    </div>
  );
}

/** Read and set a column's filter from a select box: '' means no filter. */
export function columnFilter<T extends RowData>(table: ReactTable<ListFeatures, T>, id: string) {
  const column = table.getColumn(id);
  return {
    value: (column?.getFilterValue() as string | undefined) ?? '',
    set: (value: string) => column?.setFilterValue(value || undefined),
  };
}
