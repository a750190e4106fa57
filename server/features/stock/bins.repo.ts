import { and, asc, eq, inArray, like, max, ne, or, sql, type SQL } from 'drizzle-orm';
import type { BinListQuery } from '@shared/schemas/bins';
import type { Database, Executor } from '../../db/client';
import { pageOf } from '../../db/page-of';
import { insertRows, updateRowsById } from '../../db/bulk-write';
import { preparedPerDatabase } from '../../db/prepared';
import { bins, stockMovements, type BinRow } from '../../db/schema/stock';

export type NewBinRow = typeof bins.$inferInsert;

const p = sql.placeholder;

/**
 * What a scan of a bin reads, prepared once per database. "x is ?" matches null to null, so one
 * statement finds the bins of the same spec whichever fields the spec leaves empty.
 */
const binStatements = preparedPerDatabase((db) => ({
  byCode: db.select().from(bins).where(eq(bins.code, p('code'))).prepare(),
  lastCounted: db
    .select({ at: max(stockMovements.at) })
    .from(stockMovements)
    .where(and(eq(stockMovements.kind, 'count'), eq(stockMovements.binId, p('binId'))))
    .prepare(),
  sameSpec: db
    .select()
    .from(bins)
    .where(
      and(
        ne(bins.id, p('id')),
        eq(bins.kind, p('kind')),
        sql`${bins.head} is ${p('head')}`,
        sql`${bins.material} is ${p('material')}`,
        sql`${bins.stemMaterial} is ${p('stemMaterial')}`,
        sql`${bins.diameter32} is ${p('diameter32')}`,
        sql`${bins.grip16} is ${p('grip16')}`,
        sql`${bins.gripMin} is ${p('gripMin')}`,
        sql`${bins.gripMax} is ${p('gripMax')}`,
        sql`${bins.length16} is ${p('length16')}`,
        sql`${bins.drillSize} is ${p('drillSize')}`,
        sql`(${p('diameter32')} is not null or lower(${bins.name}) = lower(${p('name')}))`,
      ),
    )
    .orderBy(asc(bins.code))
    .prepare(),
}));

export function findBinByCode(db: Database, code: string): BinRow | undefined {
  return binStatements(db).byCode.get({ code });
}

export function findBinById(db: Executor, id: number): BinRow | undefined {
  return db.select().from(bins).where(eq(bins.id, id)).get();
}

export function updateBin(db: Executor, id: number, values: Partial<NewBinRow>): BinRow {
  return db.update(bins).set(values).where(eq(bins.id, id)).returning().get();
}

/** New bins in one go (an import writes thousands inside one transaction); answers their ids in order. */
export function insertBins(db: Database, values: readonly NewBinRow[]): number[] {
  return insertRows(db, bins, values);
}

/** Sets the same fields on many bins by id. */
export function updateBins(db: Database, changes: readonly { id: number; set: Partial<NewBinRow> }[]): void {
  updateRowsById(db, bins, changes);
}

/** The next free bin code: one more than the highest B-number in use, four digits at least. */
export function nextBinCode(db: Executor): string {
  const row = db.select({ n: sql<number | null>`max(cast(substr(${bins.code}, 3) as integer))` }).from(bins).get();
  return `B-${String((row?.n ?? 0) + 1).padStart(4, '0')}`;
}

function listFilter(q: BinListQuery, lowIds?: readonly number[]): SQL | undefined {
  const text = q.q ? `%${q.q}%` : undefined;
  return and(
    q.kind ? eq(bins.kind, q.kind) : undefined,
    lowIds ? inArray(bins.id, [...lowIds]) : undefined,
    q.diameter32 ? eq(bins.diameter32, q.diameter32) : undefined,
    q.grip16 ? eq(bins.grip16, q.grip16) : undefined,
    q.material ? eq(bins.material, q.material) : undefined,
    q.location ? eq(bins.location, q.location) : undefined,
    text
      ? or(like(bins.code, text), like(bins.name, text), like(bins.location, text), like(bins.supplier, text), like(bins.supplierPart, text), like(bins.material, text), like(bins.notes, text))
      : undefined,
  );
}

/** A page of bins; `lowIds`, when given, keeps only those bins (the ones the reorder rule calls low). */
export function listBins(db: Executor, q: BinListQuery, lowIds?: readonly number[]): { rows: BinRow[]; total: number } {
  return pageOf(db, bins, listFilter(q, lowIds), asc(bins.code), q);
}

/** Every bin by supplier and code: the Restock list's order. */
export function allBinsBySupplier(db: Executor): BinRow[] {
  return db.select().from(bins).orderBy(asc(bins.supplier), asc(bins.code)).all();
}

/** When each bin was last counted. */
export function lastCountedAt(db: Database, binIds: readonly number[]): Map<number, Date> {
  if (binIds.length === 0) return new Map();
  if (binIds.length === 1) {
    const at = binStatements(db).lastCounted.get({ binId: binIds[0] })?.at;
    return new Map(at ? [[binIds[0]!, at]] : []);
  }
  const rows = db
    .select({ binId: stockMovements.binId, at: max(stockMovements.at) })
    .from(stockMovements)
    .where(and(eq(stockMovements.kind, 'count'), sql`${stockMovements.binId} in ${binIds}`))
    .groupBy(stockMovements.binId)
    .all();
  return new Map(rows.flatMap((r) => (r.at ? [[r.binId, r.at] as const] : [])));
}

/** Other bins holding exactly the same thing (kind, spec and, for non-rivets, name): where stock may move. */
export type BinSpec = Pick<BinRow, 'id' | 'kind' | 'head' | 'material' | 'stemMaterial' | 'diameter32' | 'grip16' | 'gripMin' | 'gripMax' | 'length16' | 'drillSize' | 'name'>;

export function sameSpecBins(db: Database, bin: BinSpec): BinRow[] {
  const { id, kind, head, material, stemMaterial, diameter32, grip16, gripMin, gripMax, length16, drillSize, name } = bin;
  return binStatements(db).sameSpec.all({ id, kind, head, material, stemMaterial, diameter32, grip16, gripMin, gripMax, length16, drillSize, name });
}
