import { createColumnHelper } from '@tanstack/react-table';
import type { TabSummary } from '@shared/schemas/stock-money';
import { DataTable, type ListFeatures } from '@/components/ui/data-table';
import { TextField } from '@/components/ui/field';
import { useListTable } from '@/components/ui/use-list-table';
import { dollars } from './format';
import { Cents } from './tab-columns';

const helper = createColumnHelper<ListFeatures, TabSummary>();
const byCents = (pick: (t: TabSummary) => number) => (a: { original: TabSummary }, b: { original: TabSummary }) => pick(a.original) - pick(b.original);

const columns = helper.columns([
  helper.accessor((t) => t.member.name, { id: 'name', header: 'Member', sortFn: 'text', cell: ({ getValue }) => <span className="font-medium">{getValue()}</span> }),
  helper.accessor('chargedCents', { header: 'Charged', sortFn: byCents((t) => t.chargedCents), enableGlobalFilter: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
  helper.accessor('paidCents', { header: 'Paid', sortFn: byCents((t) => t.paidCents), enableGlobalFilter: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
  helper.accessor('balanceCents', {
    header: 'Balance',
    sortFn: byCents((t) => t.balanceCents),
    enableGlobalFilter: false,
    cell: ({ getValue }) => {
      const b = getValue();
      return (
        <span className="whitespace-nowrap">
          <Cents cents={b} /> <span className="text-sm text-steel">{b > 0 ? 'owed' : b < 0 ? 'ahead' : 'settled'}</span>
        </span>
      );
    },
  }),
]);

/** Everyone with something charged or paid, the most owed first. */
export function MemberTabs({ tabs }: { tabs: TabSummary[] }) {
  const list = useListTable({ columns, data: tabs, sort: { id: 'balanceCents', desc: true } });
  const owed = tabs.reduce((s, t) => s + Math.max(0, t.balanceCents), 0);
  return (
    <div className="flex flex-col gap-3">
      <TextField label="Search members" {...list.searchProps} />
      <p className="text-sm text-steel" aria-live="polite">
        {tabs.length === 1 ? '1 member has' : `${tabs.length} members have`} a tab; {dollars(owed)} is owed to the chapter in all.
      </p>
      <DataTable table={list.table} caption="Members’ tabs" empty={tabs.length === 0 ? 'Nobody has drawn or paid anything yet.' : 'Nobody matches this search.'} />
    </div>
  );
}
