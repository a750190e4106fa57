import { and, desc, eq, gte, inArray, lt, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { MovementKind } from '@shared/stock/kinds';
import type { Database, Executor } from '../../db/client';
import { insertRows } from '../../db/bulk-write';
import { preparedPerDatabase } from '../../db/prepared';
import { bins, stockMovements, type MovementRow } from '../../db/schema/stock';
import { users } from '../../db/schema/users';
import { stationNames } from '../stations/stations.reads';

export type NewMovementRow = typeof stockMovements.$inferInsert;

export function insertMovement(db: Executor, values: NewMovementRow): MovementRow {
  return db.insert(stockMovements).values(values).returning().get();
}

/** Many entries at once (the opening stock of an import's new bins). */
export function insertMovements(db: Database, values: readonly NewMovementRow[]): void {
  insertRows(db, stockMovements, values);
}

export function findMovement(db: Executor, id: number): MovementRow | undefined {
  return db.select().from(stockMovements).where(eq(stockMovements.id, id)).get();
}

/** The inward leg of a transfer, found from its outward leg. */
export function findPairedWith(db: Executor, id: number): MovementRow | undefined {
  return db.select().from(stockMovements).where(eq(stockMovements.pairedId, id)).get();
}

export function findReversalOf(db: Executor, id: number): MovementRow | undefined {
  return db.select().from(stockMovements).where(eq(stockMovements.reversesId, id)).get();
}

/** Sets the bin's balance; the caller has already checked it stays at or above zero. */
export function setOnHand(db: Executor, binId: number, onHand: number, at: Date): void {
  db.update(bins).set({ onHand, updatedAt: at }).where(eq(bins.id, binId)).run();
}

/** The sum of a bin's movements: what on hand must always equal. */
export function ledgerSum(db: Executor, binId: number): number {
  return db.select({ n: sql<number>`coalesce(sum(${stockMovements.quantity}), 0)` }).from(stockMovements).where(eq(stockMovements.binId, binId)).get()?.n ?? 0;
}

/** A member's entries on a bin (draws, returns and reversals of either) summed: what they took out. */
const netDrawn = sql<number>`coalesce(sum(-${stockMovements.quantity}), 0)`;

/**
 * What a member has drawn from a bin, less what they returned and less reversals of either:
 * the most they may return to it.
 */
const netDrawnStatement = preparedPerDatabase((db) =>
  db
    .select({ n: netDrawn })
    .from(stockMovements)
    .where(and(eq(stockMovements.binId, sql.placeholder('binId')), eq(stockMovements.memberId, sql.placeholder('memberId'))))
    .prepare(),
);

export function netDrawnBy(db: Database, binId: number, memberId: number): number {
  return Math.max(0, netDrawnStatement(db).get({ binId, memberId })?.n ?? 0);
}

/** netDrawnBy for every bin the member has taken from, in one query (bins with nothing to return are left out). */
export function netDrawnPerBin(db: Executor, memberId: number): Map<number, number> {
  return new Map(netDrawnPerMemberAndBin(db, [memberId]).map((r) => [r.binId, r.n]));
}

/**
 * netDrawnPerBin for each of these members, in one query: a row per member and bin they have
 * something to return to (with the bin's code), nothing for the rest.
 */
export function netDrawnPerMemberAndBin(db: Executor, memberIds: readonly number[]): { memberId: number; binId: number; binCode: string; n: number }[] {
  if (memberIds.length === 0) return [];
  const rows = db
    .select({ memberId: stockMovements.memberId, binId: stockMovements.binId, binCode: bins.code, n: netDrawn })
    .from(stockMovements)
    .innerJoin(bins, eq(bins.id, stockMovements.binId))
    .where(inArray(stockMovements.memberId, [...memberIds]))
    .groupBy(stockMovements.memberId, stockMovements.binId)
    .all();
  return rows.flatMap((r) => (r.memberId !== null && r.n > 0 ? [{ memberId: r.memberId, binId: r.binId, binCode: r.binCode, n: r.n }] : []));
}

const actor = alias(users, 'actor');
const member = alias(users, 'member');
/** The entry that reverses this one, if any. */
const reversedById = sql<number | null>`(select r.id from stock_movements r where r.reverses_id = ${stockMovements.id})`;
/** Transfers: the bin on the other side (the inward leg names the outward one). */
const otherBinCode = sql<string | null>`(select b.code from stock_movements p join bins b on b.id = p.bin_id
  where ${stockMovements.kind} in ('transfer_out', 'transfer_in') and (p.id = ${stockMovements.pairedId} or p.paired_id = ${stockMovements.id}))`;

export interface LedgerFilter {
  id?: number;
  binId?: number;
  kind?: MovementKind;
  from?: Date;
  to?: Date;
  limit?: number;
}

/** Ledger entries with the names around them, newest first. */
export function listMovements(db: Executor, f: LedgerFilter) {
  const rows = db
    .select({
      m: stockMovements,
      binCode: bins.code,
      binKind: bins.kind,
      actorName: actor.name,
      memberName: member.name,
      reversedById,
      otherBinCode,
    })
    .from(stockMovements)
    .innerJoin(bins, eq(bins.id, stockMovements.binId))
    .innerJoin(actor, eq(actor.id, stockMovements.actorId))
    .leftJoin(member, eq(member.id, stockMovements.memberId))
    .where(
      and(
        f.id !== undefined ? eq(stockMovements.id, f.id) : undefined,
        f.binId !== undefined ? eq(stockMovements.binId, f.binId) : undefined,
        f.kind ? eq(stockMovements.kind, f.kind) : undefined,
        f.from ? gte(stockMovements.at, f.from) : undefined,
        f.to ? lt(stockMovements.at, f.to) : undefined,
      ),
    )
    .orderBy(desc(stockMovements.at), desc(stockMovements.id))
    .limit(f.limit ?? 500)
    .all();
  const stations = stationNames(db, rows.map((r) => r.m.stationId));
  return rows.map((r) => ({ ...r, stationName: r.m.stationId !== null ? (stations.get(r.m.stationId) ?? null) : null }));
}
export type LedgerRow = ReturnType<typeof listMovements>[number];
