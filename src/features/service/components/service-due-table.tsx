import type { ServiceDueItem } from '@shared/schemas/overdue';
import { DataTable } from '@/components/ui/data-table';
import { useListTable } from '@/components/ui/use-list-table';
import { serviceColumns } from './service-columns';

/** Tools needing the quartermaster, most urgent first. */
export function ServiceDueTable({ items, withinDays }: { items: ServiceDueItem[]; withinDays: number }) {
  const list = useListTable({ columns: serviceColumns, data: items, sort: { id: 'urgency', desc: false } });
  return (
    <DataTable
      table={list.table}
      caption="Tools due for service or calibration"
      empty={`Nothing is out of service, and no service or calibration falls due in the next ${withinDays} days.`}
    />
  );
}
