import { createColumnHelper, type FilterFn } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { Bin } from '@shared/schemas/bins';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import type { ListFeatures } from '@/components/ui/data-table';
import { formatCount, formatQuantity, gripRangeText } from '../utils/format';
import { LowStockBadge } from './low-stock-badge';

/** The fastener spec filters (diameter, grip dash, material) ride on the Designation column; '' means any. */
export interface SpecFilter {
  diameter32?: string;
  grip16?: string;
  material?: string;
}

const specFilterFn: FilterFn<ListFeatures, Bin> = (row, _columnId, value: SpecFilter) => {
  const bin = row.original;
  return (
    (!value.diameter32 || String(bin.diameter32) === value.diameter32) &&
    (!value.grip16 || String(bin.grip16) === value.grip16) &&
    (!value.material || bin.material === value.material)
  );
};
specFilterFn.autoRemove = (value?: SpecFilter) => !value || !(value.diameter32 || value.grip16 || value.material);

/** The "Low stock" toggle sets this column's filter to 'low'. */
const lowFilterFn: FilterFn<ListFeatures, Bin> = (row, _columnId, value: string) => value !== 'low' || row.original.low;

const helper = createColumnHelper<ListFeatures, Bin>();

export const binColumns = helper.columns([
  helper.accessor('code', {
    header: 'Code',
    cell: ({ getValue }) => (
      <Link to={`/bins/${getValue()}`} className="inline-flex min-h-12 items-center font-mono font-medium whitespace-nowrap underline underline-offset-4">
        {getValue()}
      </Link>
    ),
  }),
  helper.accessor('designation', {
    header: 'Designation',
    sortFn: 'text',
    filterFn: specFilterFn,
    cell: ({ row }) => {
      const bin = row.original;
      return (
        <div className="flex flex-col">
          <span className="font-medium">{bin.designation}</span>
          {bin.gripRange && bin.grip16 !== null && !bin.designation.includes(gripRangeText(bin.gripRange)) && (
            <span className="text-sm text-steel">
              Grip <span className="font-mono">−{bin.grip16}</span> takes {gripRangeText(bin.gripRange)} of sheet
            </span>
          )}
          {bin.name && bin.name !== bin.designation && <span className="text-sm text-steel">{bin.name}</span>}
        </div>
      );
    },
  }),
  helper.accessor('kind', {
    header: 'Kind',
    filterFn: 'equalsString',
    enableGlobalFilter: false,
    cell: ({ getValue }) => BIN_KIND_LABELS[getValue()],
  }),
  helper.accessor('onHand', {
    header: 'On hand',
    filterFn: lowFilterFn,
    enableGlobalFilter: false,
    cell: ({ row }) => (
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-mono whitespace-nowrap">
          {formatQuantity(row.original.onHand, row.original.unit)}
        </span>
        {row.original.low && <LowStockBadge />}
      </div>
    ),
  }),
  // The point in force (the forecast's, never below the bin's own), as Restock and the Low badge use it.
  helper.accessor('reorderAt', {
    header: 'Reorder at',
    enableGlobalFilter: false,
    cell: ({ getValue }) => <span className="font-mono">{formatCount(getValue())}</span>,
  }),
  helper.accessor('location', { header: 'Shelf', filterFn: 'equalsString' }),
]);
