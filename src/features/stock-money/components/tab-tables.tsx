import type { ColumnDef, RowData } from '@tanstack/react-table';
import type { Tab } from '@shared/schemas/stock-money';
import { DataTable, type ListFeatures } from '@/components/ui/data-table';
import { useListTable } from '@/components/ui/use-list-table';
import { tabAssemblyColumns, tabEntryColumns, tabMonthColumns } from './tab-columns';

function SmallTable<T extends RowData>({ rows, columns, caption, empty }: { rows: T[]; columns: ColumnDef<ListFeatures, T>[]; caption: string; empty: string }) {
  const list = useListTable({ columns, data: rows, pageSize: 12 });
  return <DataTable table={list.table} caption={caption} empty={empty} />;
}

export const TabByMonth = ({ tab }: { tab: Tab }) => (
  <SmallTable rows={tab.byMonth} columns={tabMonthColumns} caption="Charged and paid by month" empty="Nothing drawn or paid yet." />
);

export const TabByAssembly = ({ tab }: { tab: Tab }) => (
  <SmallTable rows={tab.byAssembly} columns={tabAssemblyColumns} caption="Charged by assembly" empty="Nothing drawn yet." />
);

export const RecentTabEntries = ({ tab }: { tab: Tab }) => (
  <SmallTable rows={tab.recent} columns={tabEntryColumns} caption="Recent draws, returns and corrections" empty="Nothing drawn yet. Scan a bin label to draw stock." />
);
