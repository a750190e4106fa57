import { useMemo } from 'react';
import { ROLE_LABELS, ROLES } from '@shared/roles';
import type { Person } from '@shared/schemas/people';
import { SelectField, TextField } from '@/components/ui/field';
import { filterOptions } from '@/components/ui/filter-options';
import { FilteredTable } from '@/components/ui/filtered-list';
import { useListTable } from '@/components/ui/use-list-table';
import { peopleColumns } from './people-columns';

const ROLE_FILTER = filterOptions('All roles', ROLES, (r) => ROLE_LABELS[r]);
const STATUS_FILTER = [
  { value: '', label: 'Everyone' },
  { value: 'active', label: 'Active' },
  { value: 'deactivated', label: 'Deactivated' },
];

export function PeopleTable({ people, selfId }: { people: Person[]; selfId: number }) {
  const columns = useMemo(() => peopleColumns(selfId), [selfId]);
  const list = useListTable({ columns, data: people, sort: { id: 'name', desc: false } });
  const filterValue = (id: string) => list.filter(id).value;
  const setFilter = (id: string, value: string) => list.filter(id).set(value);

  return (
    <div className="flex flex-col gap-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Search name or e-mail" {...list.searchProps} />
        <SelectField label="Role" options={ROLE_FILTER} value={filterValue('role')} onChange={(e) => setFilter('role', e.target.value)} />
        <SelectField label="Status" options={STATUS_FILTER} value={filterValue('status')} onChange={(e) => setFilter('status', e.target.value)} />
      </div>
      <FilteredTable list={list} total={people.length} noun="people" caption="People of the chapter" empty="Nobody matches these filters." />
    </div>
  );
}
