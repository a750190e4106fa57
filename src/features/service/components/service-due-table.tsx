import { useTable } from '@tanstack/react-table';
import type { ServiceDueItem } from '@shared/schemas/overdue';
import { DataTable, listFeatures } from '@/components/ui/data-table';
import { serviceColumns } from './service-columns';

/** Tools needing the quartermaster, most urgent first. */
export function ServiceDueTable({ items, withinDays }: { items: ServiceDueItem[]; withinDays: number }) {
  const table = useTable({
    features: listFeatures,
    columns: serviceColumns,
    data: items,
    globalFilterFn: 'includesString',
    initialState: { sorting: [{ id: 'urgency', desc: false }], pagination: { pageIndex: 0, pageSize: 25 } },
  });
  return (
    <DataTable
      table={table}
      caption="Tools due for service or calibration"
      empty={`Nothing is out of service, and no service or calibration falls due in the next ${withinDays} days.`}
    />
  );
}
