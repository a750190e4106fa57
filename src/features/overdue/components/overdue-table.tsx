import type { OverdueLoan } from '@shared/schemas/overdue';
import { DataTable } from '@/components/ui/data-table';
import { TextField } from '@/components/ui/field';
import { useListTable } from '@/components/ui/use-list-table';
import { formatCents } from '@/lib/format';
import { overdueColumns } from './overdue-columns';

/** Overdue loans, the latest back first, with a search over tool and holder. */
export function OverdueTable({ loans }: { loans: OverdueLoan[] }) {
  const list = useListTable({ columns: overdueColumns, data: loans, sort: { id: 'daysLate', desc: true } });
  const total = loans.reduce((sum, l) => sum + l.tool.replacementValueCents, 0);
  return (
    <div className="flex flex-col gap-3">
      <TextField label="Search tool or holder" {...list.searchProps} />
      <p className="text-sm text-steel" aria-live="polite">
        {loans.length === 1 ? '1 tool is' : `${loans.length} tools are`} overdue, worth {formatCents(total)} to replace.
      </p>
      <DataTable table={list.table} caption="Overdue tools" empty={loans.length === 0 ? 'Nothing is overdue. Every tool on loan is within its time.' : 'Nothing matches this search.'} />
    </div>
  );
}
