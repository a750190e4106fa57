import { Link } from 'react-router';
import type { PurchaseList as PurchaseListDto } from '@shared/schemas/forecast';
import { PURCHASE_LIST_CSV } from '../api/get-purchase-list';
import { formatCents, formatCount, formatQuantity } from '../utils/format';

type Group = PurchaseListDto['data'][number];

function SupplierOrder({ group }: { group: Group }) {
  const name = group.supplier || 'No supplier set';
  return (
    <section aria-label={name} className="rounded-xl border border-rule bg-card px-4 shadow-sm sm:px-5">
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-rule py-3">
        <h3 className="text-lg font-semibold">{name}</h3>
        <p>
          {group.lines.length} {group.lines.length === 1 ? 'line' : 'lines'} · total <span className="font-mono font-semibold">{formatCents(group.totalCents)}</span>
        </p>
      </header>
      <ul className="divide-y divide-rule">
        {group.lines.map((line) => (
          <li key={line.bin.code} className="grid gap-x-4 gap-y-1 py-3 sm:grid-cols-[7rem_1fr_auto]">
            <Link to={`/bins/${line.bin.code}`} className="inline-flex min-h-12 items-center self-start font-mono font-medium underline underline-offset-4">
              {line.bin.code}
            </Link>
            <div className="flex flex-col gap-1">
              <span className="font-medium">{line.bin.designation}</span>
              {line.bin.supplierPart && (
                <span className="text-sm">
                  Part number <span className="font-mono">{line.bin.supplierPart}</span>
                </span>
              )}
            </div>
            <div className="flex flex-col gap-1 sm:items-end sm:text-right">
              <span className="font-semibold">
                Order <span className="font-mono">{formatQuantity(line.quantity, line.bin.unit)}</span>
              </span>
              {line.bin.packSize > 1 && (
                <span className="text-sm">
                  {formatCount(line.packs)} {line.packs === 1 ? 'pack' : 'packs'} of {formatCount(line.bin.packSize)}
                </span>
              )}
              <span className="font-mono text-sm">{formatCents(line.costCents)}</span>
              {line.onOrder > 0 && <span className="text-sm text-steel">{formatQuantity(line.onOrder, line.bin.unit)} already on order</span>}
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** What to order now (the Restock list's bins and quantities), one block per supplier with its total, and the whole list as CSV. */
export function PurchaseList({ groups }: { groups: PurchaseListDto['data'] }) {
  const lines = groups.reduce((n, g) => n + g.lines.length, 0);
  const total = groups.reduce((sum, g) => sum + g.totalCents, 0);
  return (
    <div className="flex flex-col gap-4">
      {groups.length === 0 ? (
        <p>Nothing to order: no alert is waiting to be ordered.</p>
      ) : (
        <>
          <div className="flex flex-wrap items-center justify-between gap-3">
            <p>
              {formatCount(lines)} {lines === 1 ? 'line' : 'lines'} from {groups.length} {groups.length === 1 ? 'supplier' : 'suppliers'}, estimated total{' '}
              <span className="font-mono font-semibold">{formatCents(total)}</span>.
            </p>
            <a href={PURCHASE_LIST_CSV} download className="inline-flex min-h-12 items-center rounded-lg border-2 border-ink px-5 font-semibold text-ink hover:bg-paper">
              Download CSV
            </a>
          </div>
          {groups.map((g) => (
            <SupplierOrder key={g.supplier} group={g} />
          ))}
          <p className="text-sm text-steel">Costs use each bin&apos;s current unit cost; the supplier&apos;s quote may differ.</p>
        </>
      )}
    </div>
  );
}
