import { useMemo } from 'react';
import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES } from '@shared/tools/categories';
import type { Tool } from '@shared/schemas/tools';
import { SelectField, TextField } from '@/components/ui/field';
import { distinctOptions, filterOptions } from '@/components/ui/filter-options';
import { FilteredTable, FilterPanel } from '@/components/ui/filtered-list';
import { useListTable } from '@/components/ui/use-list-table';
import { toolColumns } from './tool-columns';

const CATEGORY_FILTER = filterOptions('All kinds', TOOL_CATEGORIES, (c) => CATEGORY_LABELS[c]);
const STATUS_FILTER = filterOptions('Any state', TOOL_STATUSES, (s) => STATUS_LABELS[s]);

/** The crib's catalogue: search, filter by kind, state and place, sort, page. */
export function ToolCatalog({ tools }: { tools: Tool[] }) {
  const list = useListTable({ columns: toolColumns, data: tools, sort: { id: 'code', desc: false } });
  const locations = useMemo(() => distinctOptions('Anywhere', tools.map((t) => t.location)), [tools]);
  const filterValue = (id: string) => list.filter(id).value;
  const setFilter = (id: string, value: string) => list.filter(id).set(value);
  const activeFilters = ['category', 'status', 'location'].filter((id) => filterValue(id) !== '').length;

  return (
    <div className="flex flex-col gap-3">
      <TextField label="Search code or name" {...list.searchProps} />
      <FilterPanel summary="Filter by kind, state or place" active={activeFilters}>
        <SelectField label="Kind" options={CATEGORY_FILTER} value={filterValue('category')} onChange={(e) => setFilter('category', e.target.value)} />
        <SelectField label="State" options={STATUS_FILTER} value={filterValue('status')} onChange={(e) => setFilter('status', e.target.value)} />
        <SelectField label="Place" options={locations} value={filterValue('location')} onChange={(e) => setFilter('location', e.target.value)} />
      </FilterPanel>
      <FilteredTable list={list} total={tools.length} noun="tools" caption="Tools in the crib" empty="No tool matches these filters." />
    </div>
  );
}
