import { useMemo } from 'react';
import { useTable } from '@tanstack/react-table';
import { ROLE_LABELS, ROLES } from '@shared/roles';
import type { Person } from '@shared/schemas/people';
import { columnFilter, DataTable, listFeatures } from '@/components/ui/data-table';
import { SelectField, TextField } from '@/components/ui/field';
import { peopleColumns } from './people-columns';

const ROLE_FILTER = [{ value: '', label: 'All roles' }, ...ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))];
const STATUS_FILTER = [
  { value: '', label: 'Everyone' },
  { value: 'active', label: 'Active' },
  { value: 'deactivated', label: 'Deactivated' },
];

export function PeopleTable({ people, selfId }: { people: Person[]; selfId: number }) {
  const columns = useMemo(() => peopleColumns(selfId), [selfId]);
  const table = useTable({
    features: listFeatures,
    columns,
    data: people,
    globalFilterFn: 'includesString',
    initialState: { sorting: [{ id: 'name', desc: false }], pagination: { pageIndex: 0, pageSize: 25 } },
  });
  const filterValue = (id: string) => columnFilter(table, id).value;
  const setFilter = (id: string, value: string) => columnFilter(table, id).set(value);

  return (
    <div className="flex flex-col gap-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          label="Search name or e-mail"
          type="search"
          value={String(table.state.globalFilter ?? '')}
          onChange={(e) => table.setGlobalFilter(e.target.value)}
        />
        <SelectField label="Role" options={ROLE_FILTER} value={filterValue('role')} onChange={(e) => setFilter('role', e.target.value)} />
        <SelectField label="Status" options={STATUS_FILTER} value={filterValue('status')} onChange={(e) => setFilter('status', e.target.value)} />
      </div>
      <p className="text-sm text-steel" aria-live="polite">
        Showing {table.getFilteredRowModel().rows.length} of {people.length} people
      </p>
      <DataTable table={table} caption="People of the chapter" empty="Nobody matches these filters." />
    </div>
  );
}
