import { createColumnHelper } from '@tanstack/react-table';
import type { Tab, TabEntry } from '@shared/schemas/stock-money';
import { MOVEMENT_LABELS } from '@shared/stock/kinds';
import type { ListFeatures } from '@/components/ui/data-table';
import { Code } from '@/components/ui/page';
import { formatCount } from '@/lib/format';
import { assemblyName, dayOf, dollars, monthName, unitCost } from './format';

type MonthRow = Tab['byMonth'][number];
type AssemblyRow = Tab['byAssembly'][number];

export const Cents = ({ cents }: { cents: number }) => <span className="font-mono whitespace-nowrap">{dollars(cents)}</span>;
const byNumber = <T,>(pick: (row: T) => number) => (a: { original: T }, b: { original: T }) => pick(a.original) - pick(b.original);

const month = createColumnHelper<ListFeatures, MonthRow>();
export const tabMonthColumns = month.columns([
  month.accessor('month', { header: 'Month', sortFn: 'text', cell: ({ getValue }) => <span className="font-medium">{monthName(getValue())}</span> }),
  month.accessor('chargedCents', { header: 'Charged', sortFn: byNumber((r) => r.chargedCents), cell: ({ getValue }) => <Cents cents={getValue()} /> }),
  month.accessor('paidCents', { header: 'Paid', sortFn: byNumber((r) => r.paidCents), cell: ({ getValue }) => <Cents cents={getValue()} /> }),
]);

const assembly = createColumnHelper<ListFeatures, AssemblyRow>();
export const tabAssemblyColumns = assembly.columns([
  assembly.accessor((r) => assemblyName(r.assembly), { id: 'assembly', header: 'Assembly', enableSorting: false }),
  assembly.accessor('quantity', { header: 'Units', sortFn: byNumber((r) => r.quantity), cell: ({ getValue }) => <span className="font-mono">{formatCount(getValue())}</span> }),
  assembly.accessor('chargedCents', { header: 'Charged', sortFn: byNumber((r) => r.chargedCents), cell: ({ getValue }) => <Cents cents={getValue()} /> }),
]);

/** A draw takes units out (shown as taken); a return or reversal puts them back. */
const entryWords = (e: TabEntry) => (e.kind === 'reversal' ? `Correction${e.note ? `: ${e.note}` : ''}` : MOVEMENT_LABELS[e.kind]);

const entry = createColumnHelper<ListFeatures, TabEntry>();
export const tabEntryColumns = entry.columns([
  entry.accessor('at', { header: 'Date', enableSorting: false, cell: ({ getValue }) => <span className="whitespace-nowrap">{dayOf(getValue())}</span> }),
  entry.accessor((e) => `${e.binCode} ${e.designation}`, {
    id: 'bin',
    header: 'Bin',
    enableSorting: false,
    cell: ({ row }) => (
      <div className="min-w-36">
        <Code>{row.original.binCode}</Code> <span className="text-sm">{row.original.designation}</span>
      </div>
    ),
  }),
  entry.accessor((e) => entryWords(e), { id: 'what', header: 'What', enableSorting: false }),
  entry.accessor((e) => -e.quantity, {
    id: 'units',
    header: 'Units',
    enableSorting: false,
    cell: ({ row }) => (
      <span className="font-mono whitespace-nowrap">
        {formatCount(-row.original.quantity)} × {unitCost(row.original.unitCost)}
      </span>
    ),
  }),
  entry.accessor((e) => assemblyName(e.assembly), { id: 'assembly', header: 'For', enableSorting: false }),
  entry.accessor('chargeCents', { header: 'Charge', enableSorting: false, cell: ({ getValue }) => <Cents cents={getValue()} /> }),
]);
