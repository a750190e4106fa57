import { useMemo } from 'react';
import type { Bin } from '@shared/schemas/bins';
import { BLIND_GRIP_RANGES } from '@shared/stock/fasteners';
import { BIN_KIND_LABELS, BIN_KINDS } from '@shared/stock/kinds';
import { SelectField, TextField } from '@/components/ui/field';
import { distinctOptions, filterOptions } from '@/components/ui/filter-options';
import { FilteredTable, FilterPanel } from '@/components/ui/filtered-list';
import { useListTable } from '@/components/ui/use-list-table';
import { diameterText, gripDashText } from '../utils/format';
import { binColumns, type SpecFilter } from './bin-columns';

/** The rivet diameters a chapter shop stocks, as dashes in 32nds: 3/32 to 1/4 in. */
const SHOP_DIAMETERS = [3, 4, 5, 6, 8];

const KIND_FILTER = filterOptions('All kinds', BIN_KINDS, (k) => BIN_KIND_LABELS[k]);
const DIAMETER_FILTER = filterOptions('Any diameter', SHOP_DIAMETERS, diameterText);
const GRIP_FILTER = [{ value: '', label: 'Any grip' }, ...BLIND_GRIP_RANGES.map((g) => ({ value: String(g.dash), label: gripDashText(g.dash, g) }))];

/** Every bin on the shelves: search, filter by kind, spec, shelf and low stock, sort, page. */
export function BinTable({ bins }: { bins: Bin[] }) {
  const list = useListTable({ columns: binColumns, data: bins, sort: { id: 'code', desc: false } });
  const materials = useMemo(() => distinctOptions('Any material', bins.map((b) => b.material ?? '')), [bins]);
  const locations = useMemo(() => distinctOptions('Any shelf', bins.map((b) => b.location)), [bins]);

  const filterValue = (id: string) => list.filter(id).value;
  const setFilter = (id: string, value: string) => list.filter(id).set(value);
  const designation = list.table.getColumn('designation');
  const spec = (designation?.getFilterValue() as SpecFilter | undefined) ?? {};
  const setSpec = (part: keyof SpecFilter, value: string) => designation?.setFilterValue({ ...spec, [part]: value });
  const lowOnly = filterValue('onHand') === 'low';
  const activeFilters = ['kind', 'location'].filter((id) => filterValue(id) !== '').length + Object.values(spec).filter(Boolean).length;

  return (
    <div className="flex flex-col gap-3">
      <TextField label="Search code, designation or shelf" {...list.searchProps} />
      <label className="flex min-h-12 cursor-pointer items-center gap-3 self-start rounded-lg border-2 border-rule bg-card px-3 font-semibold">
        <input type="checkbox" className="size-5 accent-ink" checked={lowOnly} onChange={(e) => setFilter('onHand', e.target.checked ? 'low' : '')} />
        Low stock only
      </label>
      <FilterPanel summary="Filter by kind, size, material or shelf" active={activeFilters}>
        <SelectField label="Kind" options={KIND_FILTER} value={filterValue('kind')} onChange={(e) => setFilter('kind', e.target.value)} />
        <SelectField label="Diameter" options={DIAMETER_FILTER} value={spec.diameter32 ?? ''} onChange={(e) => setSpec('diameter32', e.target.value)} />
        <SelectField label="Grip dash" hint="Blind rivets only." options={GRIP_FILTER} value={spec.grip16 ?? ''} onChange={(e) => setSpec('grip16', e.target.value)} />
        <SelectField label="Material" options={materials} value={spec.material ?? ''} onChange={(e) => setSpec('material', e.target.value)} />
        <SelectField label="Shelf" options={locations} value={filterValue('location')} onChange={(e) => setFilter('location', e.target.value)} />
      </FilterPanel>
      <FilteredTable list={list} total={bins.length} noun="bins" caption="Bins on the shelves" empty="No bin matches these filters." />
    </div>
  );
}
