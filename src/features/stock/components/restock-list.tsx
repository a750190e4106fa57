import { Link } from 'react-router';
import type { RestockItem } from '@shared/schemas/bins';
import { Card, Code } from '@/components/ui/page';
import { formatCents, formatCount, formatQuantity } from '../utils/format';
import { ordersBySupplier } from '../utils/restock-groups';

const packWords = (packs: number, packSize: number) => (packSize === 1 ? '' : `${formatCount(packs)} ${packs === 1 ? 'pack' : 'packs'} × ${formatCount(packSize)}`);

function RestockRow({ item }: { item: RestockItem }) {
  const packs = packWords(item.packsToOrder, item.packSize);
  return (
    <li className="grid gap-x-4 gap-y-1 py-3 sm:grid-cols-[7rem_1fr_auto]">
      <Link to={`/bins/${item.code}`} className="inline-flex min-h-12 items-center self-start font-mono font-medium underline underline-offset-4">
        {item.code}
      </Link>
      <div className="flex flex-col gap-1">
        <span className="font-medium">{item.designation}</span>
        <span className="text-sm text-steel">
          {formatQuantity(item.onHand, item.unit)} on hand{item.onOrder > 0 && `, ${formatQuantity(item.onOrder, item.unit)} on order`}; reorder at {formatCount(item.reorderAt)}
        </span>
        {item.supplierPart && (
          <span className="text-sm">
            Part number <Code>{item.supplierPart}</Code>
          </span>
        )}
      </div>
      <div className="flex flex-col gap-1 sm:items-end sm:text-right">
        <span className="font-semibold">
          Order <span className="font-mono">{formatQuantity(item.toOrder, item.unit)}</span>
        </span>
        {packs && <span className="text-sm">{packs}</span>}
        <span className="text-sm text-steel">
          About <span className="font-mono">{formatCents(item.orderCostCents)}</span>
        </span>
      </div>
    </li>
  );
}

/** What to order, one card per supplier with its estimated total. */
export function RestockList({ items }: { items: RestockItem[] }) {
  if (items.length === 0) {
    return (
      <Card>
        <p className="font-semibold">Nothing to order.</p>
        <p className="mt-1 text-steel">Every bin has more on hand and on order than its reorder point.</p>
      </Card>
    );
  }
  const orders = ordersBySupplier(items);
  const grandTotal = orders.reduce((sum, o) => sum + o.totalCents, 0);
  return (
    <div className="flex flex-col gap-4">
      <p aria-live="polite">
        {formatCount(items.length)} {items.length === 1 ? 'bin needs' : 'bins need'} ordering, from {orders.length}{' '}
        {orders.length === 1 ? 'supplier' : 'suppliers'}. Estimated total <span className="font-mono font-semibold">{formatCents(grandTotal)}</span>.
      </p>
      {orders.map((order) => (
        <section key={order.supplier} aria-label={order.supplier || 'No supplier set'} className="rounded-xl border border-rule bg-card px-4 shadow-sm sm:px-5">
          <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-rule py-3">
            <h2 className="text-lg font-semibold">{order.supplier || 'No supplier set'}</h2>
            <p>
              {order.items.length} {order.items.length === 1 ? 'line' : 'lines'} · estimated <span className="font-mono font-semibold">{formatCents(order.totalCents)}</span>
            </p>
          </header>
          <ul className="divide-y divide-rule">
            {order.items.map((item) => (
              <RestockRow key={item.code} item={item} />
            ))}
          </ul>
        </section>
      ))}
      <p className="text-sm text-steel">Costs use each bin&apos;s current unit cost; the supplier&apos;s quote may differ.</p>
    </div>
  );
}
