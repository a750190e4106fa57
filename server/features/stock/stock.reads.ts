/**
 * Stock's read models: what other features may read of the tables stock owns (bins, stock_slips,
 * stock_movements, member_payments, payment_refunds). Another feature imports this file and nothing
 * else of stock; each answer is one query however many bins or assemblies it covers.
 */
import { and, asc, count, eq, gte, inArray, lt, max, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { CatalogueBin } from '@shared/schemas/offline';
import { binDesignation } from '@shared/stock/fasteners';
import { RIVET_KINDS } from '@shared/stock/kinds';
import type { Executor } from '../../db/client';
import { bins, stockMovements, type BinRow } from '../../db/schema/stock';
import { netDrawnPerBin, netDrawnPerMemberAndBin } from './ledger.repo';
import { refundByProviderId } from './money.repo';

/** A bin as stock keeps it; other features read it, only stock writes it. */
export type { BinRow };

// ---- for payments: the tab a checkout settles, its payments and their refunds ----

export { listTabPayments, tabBalanceCents, tabPayment } from './money.service';

/** A refund recorded on a tab's payment, by the provider's refund id. */
export interface TabRefund {
  id: number;
  memberPaymentId: number;
  amountCents: number;
  at: Date;
  providerRefundId: string | null;
  /** The lead who made it; null when it came from the provider's dashboard and nobody has claimed it. */
  recordedById: number | null;
}

/** The refund recorded under a provider's refund id; undefined until it is. */
export function tabRefund(db: Executor, providerRefundId: string): TabRefund | undefined {
  const r = refundByProviderId(db, providerRefundId);
  return r && { id: r.id, memberPaymentId: r.memberPaymentId, amountCents: r.amountCents, at: r.at, providerRefundId: r.providerRefundId, recordedById: r.recordedById };
}

// ---- for planning and labels ----

/** Every bin, in code order. */
export function allBins(db: Executor): BinRow[] {
  return db.select().from(bins).orderBy(asc(bins.code)).all();
}

/** The bins of the rivet kinds: the ones an estimate's fastener needs are matched against. */
export function rivetBins(db: Executor): BinRow[] {
  return db.select().from(bins).where(inArray(bins.kind, [...RIVET_KINDS])).all();
}

/** The bins with these codes, by code; codes no bin has are absent. */
export function binsWithCodes(db: Executor, codes: readonly string[]): Map<string, BinRow> {
  const unique = [...new Set(codes)];
  if (unique.length === 0) return new Map();
  return new Map(db.select().from(bins).where(inArray(bins.code, unique)).all().map((b) => [b.code, b]));
}

/** The bins with these ids, by id; ids no bin has are absent. */
export function binsWithIds(db: Executor, ids: readonly number[]): Map<number, BinRow> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  return new Map(db.select().from(bins).where(inArray(bins.id, unique)).all().map((b) => [b.id, b]));
}

/** Ledger kinds that take units for an assembly or give them back; a reversal undoes one of them. */
const CONSUMING: ('draw' | 'return_unused')[] = ['draw', 'return_unused'];

/**
 * Drawn per assembly and bin: the units drawn for each of these assemblies from each bin, net of
 * returns and reversals, keyed `assemblyId:binId`. One query for all of them.
 */
export function drawnForAssemblies(db: Executor, assemblyIds: readonly number[]): Map<string, number> {
  const unique = [...new Set(assemblyIds)];
  if (unique.length === 0) return new Map();
  const rows = db
    .select({ assemblyId: stockMovements.assemblyId, binId: stockMovements.binId, n: sql<number>`-sum(${stockMovements.quantity})` })
    .from(stockMovements)
    .where(and(inArray(stockMovements.assemblyId, unique), inArray(stockMovements.kind, [...CONSUMING, 'reversal'])))
    .groupBy(stockMovements.assemblyId, stockMovements.binId)
    .all();
  return new Map(rows.map((r) => [`${r.assemblyId}:${r.binId}`, r.n]));
}

/** Drawn for one assembly: units drawn for it from each bin (bin id → units), net of returns and reversals. */
export function drawnForAssembly(db: Executor, assemblyId: number): Map<number, number> {
  const prefix = `${assemblyId}:`;
  return new Map([...drawnForAssemblies(db, [assemblyId])].map(([key, n]) => [Number(key.slice(prefix.length)), n]));
}

/** How many ledger entries name the assembly (draws, returns and their reversals). */
export function countEntriesNamingAssembly(db: Executor, assemblyId: number): number {
  return db.select({ n: count() }).from(stockMovements).where(eq(stockMovements.assemblyId, assemblyId)).get()?.n ?? 0;
}

const reversed = alias(stockMovements, 'reversed');

/**
 * Net consumption per bin and week since `from` (a week start) up to `to`: draws less returns,
 * each reversal of either counted against what it undoes. One row per bin and week, summed in SQL.
 */
export function weeklyConsumption(db: Executor, from: Date, to: Date, weekMs: number): { binId: number; week: number; quantity: number }[] {
  const week = sql<number>`cast((${stockMovements.at} - ${from.getTime()}) / ${weekMs} as integer)`;
  return db
    .select({ binId: stockMovements.binId, week, quantity: sql<number>`-sum(${stockMovements.quantity})` })
    .from(stockMovements)
    .leftJoin(reversed, eq(reversed.id, stockMovements.reversesId))
    .where(
      and(
        gte(stockMovements.at, from),
        lt(stockMovements.at, to),
        or(inArray(stockMovements.kind, CONSUMING), and(eq(stockMovements.kind, 'reversal'), inArray(reversed.kind, CONSUMING))),
      ),
    )
    .groupBy(stockMovements.binId, week)
    .all();
}

// ---- for offline ----

/** Every bin as an offline copy keeps it, `drawnByYou` from the map (bin id → units) or 0: one query. */
function catalogueBinsWith(db: Executor, drawn: ReadonlyMap<number, number>): CatalogueBin[] {
  return allBins(db).map((bin) => ({
    code: bin.code,
    kind: bin.kind,
    designation: binDesignation(bin),
    location: bin.location,
    unit: bin.unit,
    onHand: bin.onHand,
    drawnByYou: drawn.get(bin.id) ?? 0,
  }));
}

/** Every bin, as a phone keeps it for offline use, with what this member may return unused to each: two queries. */
export function catalogueBins(db: Executor, memberId: number): CatalogueBin[] {
  return catalogueBinsWith(db, netDrawnPerBin(db, memberId));
}

/** Every bin, as a station keeps it for offline use: nobody's `drawnByYou` (0; each person's is in `drawnByPerson`). One query. */
export function stationCatalogueBins(db: Executor): CatalogueBin[] {
  return catalogueBinsWith(db, new Map());
}

/**
 * What each of these people may return unused, by person: bin code → units drawn and not returned
 * (the very rule behind `drawnByYou`), bins at zero left out. One query; someone with nothing is absent.
 */
export function drawnByPerson(db: Executor, personIds: readonly number[]): Map<number, Record<string, number>> {
  const byPerson = new Map<number, Record<string, number>>();
  for (const r of netDrawnPerMemberAndBin(db, personIds)) {
    const drawn = byPerson.get(r.memberId) ?? {};
    drawn[r.binCode] = r.n;
    byPerson.set(r.memberId, drawn);
  }
  return byPerson;
}

// ---- for the demo seed ----

/** The code of the bin with this name, if one has it. */
export function binCodeNamed(db: Executor, name: string): string | undefined {
  return db.select({ code: bins.code }).from(bins).where(eq(bins.name, name)).get()?.code;
}

/** When the bin's last ledger entry was made; undefined for a bin with none. */
export function lastEntryAt(db: Executor, binId: number): Date | undefined {
  return db.select({ at: max(stockMovements.at) }).from(stockMovements).where(eq(stockMovements.binId, binId)).get()?.at ?? undefined;
}
