import { createColumnHelper } from '@tanstack/react-table';
import type { OverdueLoan } from '@shared/schemas/overdue';
import type { ListFeatures } from '@/components/ui/data-table';
import { Code } from '@/components/ui/page';
import { formatCents, formatDueDay } from '@/lib/format';
import { LateBadge } from './late-badge';
import { ReminderButton } from './reminder-button';

const helper = createColumnHelper<ListFeatures, OverdueLoan>();
const LINK = 'inline-flex min-h-11 items-center font-medium [overflow-wrap:anywhere] underline underline-offset-4';

export const overdueColumns = helper.columns([
  helper.accessor((l) => `${l.tool.code} ${l.tool.name}`, {
    id: 'tool',
    header: 'Tool',
    sortFn: (a, b) => a.original.tool.code.localeCompare(b.original.tool.code),
    cell: ({ row }) => (
      <div className="min-w-40">
        <div className="font-medium">
          <Code>{row.original.tool.code}</Code> {row.original.tool.name}
        </div>
        {row.original.tool.location && <div className="text-sm text-steel">Lives at {row.original.tool.location}</div>}
      </div>
    ),
  }),
  helper.accessor('daysLate', {
    header: 'Late',
    sortFn: (a, b) => a.original.daysLate - b.original.daysLate,
    enableGlobalFilter: false,
    cell: ({ row }) => (
      <div className="flex flex-col items-start gap-0.5">
        <LateBadge daysLate={row.original.daysLate} />
        <span className="text-sm text-steel">due {formatDueDay(row.original.dueAt)}</span>
      </div>
    ),
  }),
  helper.accessor((l) => `${l.holder.name} ${l.holder.email}`, {
    id: 'holder',
    header: 'Holder',
    sortFn: (a, b) => a.original.holder.name.localeCompare(b.original.holder.name),
    cell: ({ row }) => <span className="font-medium">{row.original.holder.name}</span>,
  }),
  helper.display({
    id: 'contact',
    header: 'Contact',
    cell: ({ row }) => (
      <div className="flex flex-col sm:min-w-52">
        <a className={LINK} href={`mailto:${row.original.holder.email}`}>
          {row.original.holder.email}
        </a>
        {row.original.holder.phone && (
          <a className={LINK} href={`tel:${row.original.holder.phone.replace(/[^\d+]/g, '')}`}>
            {row.original.holder.phone}
          </a>
        )}
      </div>
    ),
  }),
  helper.accessor((l) => l.tool.replacementValueCents, {
    id: 'value',
    header: 'Value',
    sortFn: (a, b) => a.original.tool.replacementValueCents - b.original.tool.replacementValueCents,
    enableGlobalFilter: false,
    cell: ({ getValue }) => <span className="font-mono whitespace-nowrap">{formatCents(getValue())}</span>,
  }),
  helper.display({
    id: 'reminder',
    header: 'Reminder',
    cell: ({ row }) => <ReminderButton loan={row.original} />,
  }),
]);
