import { binDesignation } from '@shared/stock/fasteners';
import type { Executor } from '../../db/client';
import { findBinById } from './bins.repo';
import { listMovements } from './ledger.repo';

export interface RecentWriteOff {
  id: number;
  binCode: string;
  designation: string;
  unit: string;
  /** How much went, as a positive quantity. */
  quantity: number;
  by: string;
  at: Date;
  note: string;
}

/** Write-offs since `since` that still stand (not reversed), newest first. A read only. */
export function recentWriteOffs(db: Executor, since: Date, limit = 20): RecentWriteOff[] {
  return listMovements(db, { kind: 'write_off', from: since, limit })
    .filter((r) => r.reversedById === null)
    .flatMap((r) => {
      const bin = findBinById(db, r.m.binId);
      if (!bin) return [];
      return [{ id: r.m.id, binCode: r.binCode, designation: binDesignation(bin), unit: bin.unit, quantity: -r.m.quantity, by: r.actorName, at: r.m.at, note: r.m.note }];
    });
}
