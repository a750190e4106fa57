import { createColumnHelper } from '@tanstack/react-table';
import { SERVICE_URGENCIES, type ServiceDueItem } from '@shared/schemas/overdue';
import type { ListFeatures } from '@/components/ui/data-table';
import { Code } from '@/components/ui/page';
import { formatDate } from '@/lib/format';
import { ServiceAction } from './service-action';
import { UrgencyBadge } from './urgency-badge';

const helper = createColumnHelper<ListFeatures, ServiceDueItem>();
const rank = (i: ServiceDueItem) => SERVICE_URGENCIES.indexOf(i.urgency) * 100_000 + (i.daysUntilDue ?? 50_000);

export const serviceColumns = helper.columns([
  helper.accessor((i) => `${i.code} ${i.name} ${i.location}`, {
    id: 'tool',
    header: 'Tool',
    sortFn: (a, b) => a.original.code.localeCompare(b.original.code),
    cell: ({ row }) => (
      <div className="min-w-40">
        <div className="font-medium">
          <Code>{row.original.code}</Code> {row.original.name}
        </div>
        {row.original.location && <div className="text-sm text-steel">Lives at {row.original.location}</div>}
      </div>
    ),
  }),
  helper.accessor(rank, {
    id: 'urgency',
    header: 'State',
    sortFn: (a, b) => rank(a.original) - rank(b.original),
    enableGlobalFilter: false,
    cell: ({ row }) => <UrgencyBadge urgency={row.original.urgency} words={row.original.words} />,
  }),
  helper.accessor((i) => i.lastServiceAt ?? '', {
    id: 'lastService',
    header: 'Last serviced',
    enableGlobalFilter: false,
    cell: ({ row }) => (
      <span className="whitespace-nowrap">
        {row.original.lastServiceAt ? formatDate(row.original.lastServiceAt) : 'Not on record'}
        {row.original.serviceIntervalDays && <span className="block text-sm text-steel">every {row.original.serviceIntervalDays} days</span>}
      </span>
    ),
  }),
  helper.display({
    id: 'action',
    header: 'Action',
    cell: ({ row }) => <ServiceAction item={row.original} />,
  }),
]);
