import { asc } from 'drizzle-orm';
import type { CatalogueBin } from '@shared/schemas/offline';
import { binDesignation } from '@shared/stock/fasteners';
import type { Executor } from '../../db/client';
import { bins } from '../../db/schema/stock';
import { netDrawnPerBin } from './ledger.repo';

/** Every bin, as a phone keeps it for offline use, with what this member may return unused to each: two queries. */
export function catalogueBins(db: Executor, memberId: number): CatalogueBin[] {
  const drawn = netDrawnPerBin(db, memberId);
  return db
    .select()
    .from(bins)
    .orderBy(asc(bins.code))
    .all()
    .map((bin) => ({
      code: bin.code,
      kind: bin.kind,
      designation: binDesignation(bin),
      location: bin.location,
      unit: bin.unit,
      onHand: bin.onHand,
      drawnByYou: drawn.get(bin.id) ?? 0,
    }));
}
