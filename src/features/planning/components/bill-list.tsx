import { Link } from 'react-router';
import type { BillLine } from '@shared/schemas/builds';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import { formatCount } from '@/lib/format';

/**
 * What the assembly takes from the bins: each need with the bin that stocks it, on hand against
 * needed with the waste allowance, what is short, and what has been drawn for it so far.
 */
export function BillList({ bill, wastePercent }: { bill: BillLine[]; wastePercent: number }) {
  if (bill.length === 0) return <p className="text-steel">Nothing to draw yet: add rivet lines or extra items.</p>;
  return (
    <ul className="flex flex-col gap-3">
      {bill.map((item, i) => (
        <li key={i} className="rounded-lg border border-rule bg-card p-3" aria-label={item.description}>
          <p className="font-semibold">{item.description}</p>
          <p className="text-sm text-steel">
            {BIN_KIND_LABELS[item.kind]}
            {item.lines.length > 0 && ` · ${item.lines.length === 1 ? 'line' : 'lines'} ${item.lines.map((l) => l + 1).join(', ')}`}
          </p>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="text-sm text-steel">Need</dt>
            <dd className="font-mono">
              {formatCount(item.estimated)}
              {item.withWaste !== item.estimated && ` (${formatCount(item.withWaste)} with ${wastePercent} % waste)`}
            </dd>
            <dt className="text-sm text-steel">Drawn so far</dt>
            <dd className="font-mono">
              {formatCount(item.drawn)} of {formatCount(item.estimated)} estimated
            </dd>
            {item.bin && (
              <>
                <dt className="text-sm text-steel">Bin</dt>
                <dd>
                  <Link to={`/bins/${item.bin.code}`} className="inline-flex min-h-12 items-center font-mono font-semibold underline underline-offset-4">
                    {item.bin.code}
                  </Link>{' '}
                  {item.bin.location && <span className="text-sm text-steel">· {item.bin.location}</span>}
                </dd>
                <dt className="text-sm text-steel">On hand</dt>
                <dd className="font-mono">{formatCount(item.bin.onHand)}</dd>
              </>
            )}
          </dl>
          {item.unstocked ? (
            <p className="mt-2 rounded-md border-l-4 border-warn bg-warn-soft px-3 py-2 text-sm">
              <strong>Not stocked:</strong> {item.unstocked}
            </p>
          ) : item.shortBy > 0 ? (
            <p className="mt-2 rounded-md border-l-4 border-bad bg-bad-soft px-3 py-2 text-sm">
              <strong>Short by {formatCount(item.shortBy)}:</strong> the bin has {formatCount(item.bin?.onHand ?? 0)} on hand, {item.drawn > 0 ? `${formatCount(item.toDraw)} are still to draw` : `the assembly needs ${formatCount(item.withWaste)}`}.
            </p>
          ) : (
            item.bin && <p className="mt-2 text-sm text-ok">Enough on hand.</p>
          )}
        </li>
      ))}
    </ul>
  );
}
