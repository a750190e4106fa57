import { useMemo } from 'react';
import { useTable } from '@tanstack/react-table';
import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES } from '@shared/tools/categories';
import type { Tool } from '@shared/schemas/tools';
import { columnFilter, DataTable, listFeatures } from '@/components/ui/data-table';
import { SelectField, TextField } from '@/components/ui/field';
import { toolColumns } from './tool-columns';

const CATEGORY_FILTER = [{ value: '', label: 'All kinds' }, ...TOOL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))];
const STATUS_FILTER = [{ value: '', label: 'Any state' }, ...TOOL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))];

/** The crib's catalogue: search, filter by kind, state and place, sort, page. */
export function ToolCatalog({ tools }: { tools: Tool[] }) {
  const table = useTable({
    features: listFeatures,
    columns: toolColumns,
    data: tools,
    globalFilterFn: 'includesString',
    initialState: { sorting: [{ id: 'code', desc: false }], pagination: { pageIndex: 0, pageSize: 25 } },
  });
  const locations = useMemo(
    () => [{ value: '', label: 'Anywhere' }, ...[...new Set(tools.map((t) => t.location).filter(Boolean))].sort().map((l) => ({ value: l, label: l }))],
    [tools],
  );
  const filterValue = (id: string) => columnFilter(table, id).value;
  const setFilter = (id: string, value: string) => columnFilter(table, id).set(value);
  const activeFilters = ['category', 'status', 'location'].filter((id) => filterValue(id) !== '').length;

  return (
    <div className="flex flex-col gap-3">
      <TextField
        label="Search code or name"
        type="search"
        value={String(table.state.globalFilter ?? '')}
        onChange={(e) => table.setGlobalFilter(e.target.value)}
      />
      <details className="rounded-lg border border-rule bg-card px-3" open={activeFilters > 0 || undefined}>
        <summary className="flex min-h-12 cursor-pointer items-center font-semibold">
          Filter by kind, state or place{activeFilters > 0 ? ` (${activeFilters} on)` : ''}
        </summary>
        <div className="grid gap-3 pb-3 sm:grid-cols-3">
          <SelectField label="Kind" options={CATEGORY_FILTER} value={filterValue('category')} onChange={(e) => setFilter('category', e.target.value)} />
          <SelectField label="State" options={STATUS_FILTER} value={filterValue('status')} onChange={(e) => setFilter('status', e.target.value)} />
          <SelectField label="Place" options={locations} value={filterValue('location')} onChange={(e) => setFilter('location', e.target.value)} />
        </div>
      </details>
      <p className="text-sm text-steel" aria-live="polite">
        Showing {table.getFilteredRowModel().rows.length} of {tools.length} tools
      </p>
      <DataTable table={table} caption="Tools in the crib" empty="No tool matches these filters." />
    </div>
  );
}
