import type { BinFields, BinReorder } from '@shared/schemas/bins';
import { blindGripRange } from '@shared/stock/fasteners';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import { rivetBinCaution } from '@shared/stock/rivet-cautions';
import { unitWord } from '@shared/stock/quantity-words';
import { Notice } from '@/components/ui/notice';
import { Code, PageHeading } from '@/components/ui/page';
import { formatCents, formatCount, formatDate, formatQuantity, formatUnitCost, gripRangeText } from '../utils/format';

const sameRange = (a: { min: number; max: number }, b: { min: number; max: number } | undefined) => b !== undefined && a.min === b.min && a.max === b.max;

/** Why the bin needs ordering and, for the quartermaster, what to order: the one reorder rule's numbers, as on Restock. */
function lowStockWords(bin: BinFields, r: BinReorder, isQuartermaster: boolean): string {
  const level = bin.onHand === 0 ? `${bin.code} is empty` : `Only ${formatQuantity(bin.onHand, bin.unit)} left`;
  const onOrder = r.onOrder > 0 ? `, with ${formatQuantity(r.onOrder, bin.unit)} on order` : '';
  const point = `${level}${onOrder}, at or below the reorder point of ${formatCount(r.reorderAt)} or short of what planned work needs.`;
  if (r.toOrder === 0) return `${point} The quartermaster dismissed its reorder alert.`;
  if (!isQuartermaster) return `${point} The quartermaster has it on the Restock list.`;
  const packs = r.toOrder / bin.packSize;
  const order = bin.packSize > 1 ? `${formatQuantity(r.toOrder, bin.unit)} (${formatCount(packs)} pack${packs === 1 ? '' : 's'} of ${formatCount(bin.packSize)})` : formatQuantity(r.toOrder, bin.unit);
  return `${point} Order ${order}${bin.supplier ? ` from ${bin.supplier}` : ''}.`;
}

/** The top of a scanned bin's screen: what it holds, how many, and (once the reorder rule has answered) whether it runs low. */
export function BinSummary({ bin, reorder, isQuartermaster }: { bin: BinFields; reorder?: BinReorder; isQuartermaster: boolean }) {
  return (
    <section aria-labelledby="bin-designation" className="flex flex-col gap-3">
      <div>
        <p className="font-mono text-lg font-medium text-brass-deep">{bin.code}</p>
        <PageHeading id="bin-designation" title={bin.designation} tabTitle={`${bin.code} ${bin.designation}`} className="leading-tight" />
        <p className="text-steel">{BIN_KIND_LABELS[bin.kind]}</p>
      </div>
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <p>
          <span className="text-5xl font-bold tabular-nums" data-testid="bin-on-hand">
            {formatCount(bin.onHand)}
          </span>{' '}
          <span className="text-lg">
            {unitWord(bin.onHand, bin.unit)} on hand
          </span>
        </p>
        {bin.packSize > 1 && <p className="text-steel">packs of {formatCount(bin.packSize)}</p>}
        {reorder && reorder.onOrder > 0 && <p data-testid="bin-on-order">{formatQuantity(reorder.onOrder, bin.unit)} on order</p>}
      </div>
      {reorder?.low && (
        <Notice tone="warn" title={bin.onHand === 0 ? 'Empty' : 'Low stock'}>
          {lowStockWords(bin, reorder, isQuartermaster)}
        </Notice>
      )}
    </section>
  );
}

/** Where the bin lives, its spec details, cost and (for the quartermaster) its supplier, with the usual caution for rivets. */
export function BinDetails({ bin, reorder, isQuartermaster }: { bin: BinFields; reorder?: BinReorder; isQuartermaster: boolean }) {
  const rivetCaution = rivetBinCaution(bin.kind);
  return (
    <section aria-label={`About ${bin.code}`} className="flex flex-col gap-3">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
        <dt className="text-steel">Location</dt>
        <dd className="font-medium">{bin.location || 'not set'}</dd>
        {bin.gripRange && bin.grip16 !== null && (
          <>
            <dt className="text-steel">Grip</dt>
            <dd>
              <Code>−{bin.grip16}</Code>: sheet stack <Code>{gripRangeText(bin.gripRange)}</Code>
              {!sameRange(bin.gripRange, blindGripRange(bin.grip16)) && <span className="text-steel"> (from the box)</span>}
            </dd>
          </>
        )}
        {(bin.holeDrill ?? bin.drillSize) && (
          <>
            <dt className="text-steel">{bin.kind === 'drill_bit' ? 'Drill size' : 'Hole drill'}</dt>
            <dd>
              <Code>{bin.holeDrill ?? bin.drillSize}</Code>
            </dd>
          </>
        )}
        <dt className="text-steel">Reorder point</dt>
        <dd>
          {formatCount(reorder?.reorderAt ?? bin.reorderPoint)}
          {reorder && reorder.reorderAt > bin.reorderPoint && <span className="text-steel"> (planned work raises the bin&apos;s own {formatCount(bin.reorderPoint)})</span>}
        </dd>
        <dt className="text-steel">Unit cost</dt>
        <dd>
          <Code>{formatUnitCost(bin.unitCost)}</Code> per {bin.unit === 'each' ? 'piece' : bin.unit}
        </dd>
        {isQuartermaster && (
          <>
            <dt className="text-steel">Stock value</dt>
            <dd>{formatCents(bin.stockValueCents)}</dd>
            <dt className="text-steel">Supplier</dt>
            <dd>
              {bin.supplier || 'not set'}
              {bin.supplierPart && (
                <>
                  {' '}
                  · part <Code>{bin.supplierPart}</Code>
                </>
              )}
            </dd>
            <dt className="text-steel">Lead time</dt>
            <dd>
              {bin.leadTimeDays} day{bin.leadTimeDays === 1 ? '' : 's'}
            </dd>
            <dt className="text-steel">Last counted</dt>
            <dd>{bin.lastCountedAt ? formatDate(bin.lastCountedAt) : 'never'}</dd>
          </>
        )}
      </dl>
      {bin.notes && <p className="whitespace-pre-line">{bin.notes}</p>}
      {rivetCaution && (
        <Notice tone="warn" title="Right rivet, right place">
          {rivetCaution}
        </Notice>
      )}
    </section>
  );
}
