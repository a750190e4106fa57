/**
 * The stations feature's read models: what other features may read of the tables it owns
 * (stations). Another feature imports this file and nothing else of stations.
 */
import { inArray } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { stations } from '../../db/schema/stations';

// for tools (the audit trail) and stock (the ledger): "at <station name>"

/** The names of these stations by id (revoked ones keep their name). */
export function stationNames(db: Executor, ids: Iterable<number | null>): Map<number, string> {
  const wanted = [...new Set([...ids].filter((id): id is number => id !== null))];
  if (wanted.length === 0) return new Map();
  return new Map(db.select({ id: stations.id, name: stations.name }).from(stations).where(inArray(stations.id, wanted)).all().map((r) => [r.id, r.name]));
}
