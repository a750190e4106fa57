import { useTable } from '@tanstack/react-table';
import type { OverdueLoan } from '@shared/schemas/overdue';
import { DataTable, listFeatures } from '@/components/ui/data-table';
import { TextField } from '@/components/ui/field';
import { formatCents } from '@/lib/format';
import { overdueColumns } from './overdue-columns';

/** Overdue loans, the latest back first, with a search over tool and holder. */
export function OverdueTable({ loans }: { loans: OverdueLoan[] }) {
  const table = useTable({
    features: listFeatures,
    columns: overdueColumns,
    data: loans,
    globalFilterFn: 'includesString',
    initialState: { sorting: [{ id: 'daysLate', desc: true }], pagination: { pageIndex: 0, pageSize: 25 } },
  });
  const total = loans.reduce((sum, l) => sum + l.tool.replacementValueCents, 0);
  return (
    <div className="flex flex-col gap-3">
      <TextField
        label="Search tool or holder"
        type="search"
        value={String(table.state.globalFilter ?? '')}
        onChange={(e) => table.setGlobalFilter(e.target.value)}
      />
      <p className="text-sm text-steel" aria-live="polite">
        {loans.length === 1 ? '1 tool is' : `${loans.length} tools are`} overdue, worth {formatCents(total)} to replace.
      </p>
      <DataTable table={table} caption="Overdue tools" empty={loans.length === 0 ? 'Nothing is overdue. Every tool on loan is within its time.' : 'Nothing matches this search.'} />
    </div>
  );
}
