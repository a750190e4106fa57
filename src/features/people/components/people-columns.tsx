import { createColumnHelper } from '@tanstack/react-table';
import { ROLE_LABELS } from '@shared/roles';
import type { Person } from '@shared/schemas/people';
import type { ListFeatures } from '@/components/ui/data-table';
import { Code } from '@/components/ui/page';
import { formatDate } from '@/lib/format';
import { PersonActions } from './person-actions';
import { StationActions, StationState } from './station-access';

const helper = createColumnHelper<ListFeatures, Person>();

export function peopleColumns(selfId: number) {
  return helper.columns([
    helper.accessor((p) => `${p.name} ${p.email}`, {
      id: 'name',
      header: 'Name',
      sortFn: (a, b) => a.original.name.localeCompare(b.original.name),
      cell: ({ row }) => (
        <div className="min-w-40">
          <div className="font-medium">{row.original.name}</div>
          <div className="text-sm text-steel">
            <Code>{row.original.email}</Code>
          </div>
        </div>
      ),
    }),
    helper.accessor('role', {
      header: 'Role',
      filterFn: 'equalsString',
      enableGlobalFilter: false,
      cell: ({ getValue }) => ROLE_LABELS[getValue()],
    }),
    helper.accessor((p) => (p.active ? 'active' : 'deactivated'), {
      id: 'status',
      header: 'Status',
      filterFn: 'equalsString',
      enableGlobalFilter: false,
      cell: ({ getValue }) =>
        getValue() === 'active' ? (
          <span className="rounded bg-ok-soft px-2 py-0.5 text-sm font-medium text-ok">Active</span>
        ) : (
          <span className="rounded bg-bad-soft px-2 py-0.5 text-sm font-medium text-bad">Deactivated</span>
        ),
    }),
    helper.display({
      id: 'station',
      header: 'Crib station',
      cell: ({ row }) => (
        <div className="flex flex-col gap-2">
          <StationState person={row.original} />
          <StationActions person={row.original} />
        </div>
      ),
    }),
    helper.accessor('createdAt', {
      header: 'Joined',
      sortFn: 'datetime',
      enableGlobalFilter: false,
      cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDate(getValue())}</span>,
    }),
    helper.display({
      id: 'actions',
      header: 'Change',
      cell: ({ row }) => <PersonActions person={row.original} isSelf={row.original.id === selfId} />,
    }),
  ]);
}
