import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import { CATEGORY_LABELS } from '@shared/tools/categories';
import type { Tool } from '@shared/schemas/tools';
import type { ListFeatures } from '@/components/ui/data-table';
import { DueBadge } from './due-badge';
import { ToolStatusBadge } from './tool-status-badge';

const helper = createColumnHelper<ListFeatures, Tool>();

export const toolColumns = helper.columns([
  helper.accessor('code', {
    header: 'Code',
    cell: ({ getValue }) => (
      <Link to={`/tools/${getValue()}`} className="inline-flex min-h-11 items-center font-mono font-medium whitespace-nowrap underline underline-offset-4">
        {getValue()}
      </Link>
    ),
  }),
  helper.accessor('name', { header: 'Name', sortFn: 'text' }),
  helper.accessor('category', {
    header: 'Kind',
    filterFn: 'equalsString',
    enableGlobalFilter: false,
    cell: ({ getValue }) => CATEGORY_LABELS[getValue()],
  }),
  helper.accessor('status', {
    header: 'State',
    filterFn: 'equalsString',
    enableGlobalFilter: false,
    cell: ({ row }) => (
      <div className="flex flex-col items-start gap-1">
        <ToolStatusBadge status={row.original.status} />
        {row.original.loan && (
          <span className="text-sm text-steel">
            {row.original.loan.holder.name} · <DueBadge dueAt={row.original.loan.dueAt} />
          </span>
        )}
      </div>
    ),
  }),
  helper.accessor('location', { header: 'Lives at', filterFn: 'equalsString' }),
]);
