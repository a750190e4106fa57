import type { BinForYou, BinList, BinListQuery, BinReorder, CreateBinInput, RestockItem, UpdateBinBody, Bin, BinAction } from '@shared/schemas/bins';
import { hasRole } from '@shared/roles';
import { z } from 'zod';
import { binKindRules, gripRangeAfterEdit, withGripRange } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import type { BinRow } from '../../db/schema/stock';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { parseInput } from '../../lib/validate';
import { toBinDto, toBinFields } from './bin-dto';
import { binReorders } from '../planning/planning.reads';
import { nothingToOrder } from './bin-reorders';
import { allBinsBySupplier, findBinByCode, insertBins, lastCountedAt, listBins, nextBinCode, sameSpecBins, updateBin, updateBins, type NewBinRow } from './bins.repo';
import { binOrThrow } from './ledger.service';
import { insertMovements, netDrawnBy } from './ledger.repo';
import { dollarsToE4 } from '@shared/stock/money';

/** Bins as the API shows them: with when each was last counted and what the one reorder rule orders now. */
function withCounts(ctx: ServiceContext, reorders: ReadonlyMap<number, BinReorder>, rows: BinRow[]): Bin[] {
  const counted = lastCountedAt(ctx.db, rows.map((r) => r.id));
  return rows.map((r) => toBinDto(r, reorders.get(r.id) ?? nothingToOrder(r.reorderPoint), counted.get(r.id)));
}

/** A page of bins; "low only" means what the reorder rule calls low, as on Restock. */
export function listBinPage(ctx: ServiceContext, query: BinListQuery): BinList {
  const reorders = binReorders(ctx);
  const lowIds = query.low ? [...reorders].filter(([, r]) => r.low).map(([id]) => id) : undefined;
  const { rows, total } = listBins(ctx.db, query, lowIds);
  return { data: withCounts(ctx, reorders, rows), meta: { total, page: query.page, pageSize: query.pageSize } };
}

export function getBin(ctx: ServiceContext, code: string): Bin {
  return withCounts(ctx, binReorders(ctx), [binOrThrow(ctx.db, code)])[0]!;
}

/** What the one reorder rule says of one bin now (the bin page reads it beside the scan answer). */
export function getBinReorder(ctx: ServiceContext, code: string): BinReorder {
  const bin = binOrThrow(ctx.db, code);
  return binReorders(ctx).get(bin.id) ?? nothingToOrder(bin.reorderPoint);
}

/** The scan answer: hot, so it reads the bin's own row and the person's part only, never the forecast. */
export function getBinForYou(ctx: ServiceContext, user: UserRow, code: string): BinForYou {
  const bin = binOrThrow(ctx.db, code);
  const yourNetDrawn = netDrawnBy(ctx.db, bin.id, user.id);
  const quartermaster = hasRole(user.role, 'quartermaster');
  const actions: BinAction[] = [];
  if (bin.onHand > 0) actions.push('draw');
  if (yourNetDrawn > 0) actions.push('return_unused');
  if (quartermaster) actions.push('receive', 'count');
  const others = quartermaster ? sameSpecBins(ctx.db, bin) : [];
  if (quartermaster && bin.onHand > 0 && others.length > 0) actions.push('move');
  if (quartermaster && bin.onHand > 0) actions.push('write_off');
  return {
    ...toBinFields(bin, lastCountedAt(ctx.db, [bin.id]).get(bin.id)),
    forYou: { actions, yourNetDrawn, sameSpecBins: others.map((b) => ({ code: b.code, location: b.location, onHand: b.onHand })) },
  };
}

function rowValues(input: Partial<CreateBinInput>): Partial<NewBinRow> {
  const { unitCost, ...rest } = input;
  const values: Partial<NewBinRow> & { code?: string; initialQuantity?: number } = { ...rest };
  delete values.initialQuantity;
  if (unitCost !== undefined) values.unitCostE4 = dollarsToE4(unitCost);
  return values;
}

const codeTaken = (code: string) =>
  new HttpError(409, 'BIN_CODE_TAKEN', `The code ${code} is already on another bin. Leave the code empty to get the next free one.`, [{ path: 'code', message: `${code} is taken.` }]);

/** A new bin; opening stock becomes its first ledger entry, so on hand is the ledger's sum from the start. */
export function createBin(ctx: ServiceContext, actor: UserRow, input: CreateBinInput): Bin {
  return getBin(ctx, insertNewBin(ctx, actor, input).code);
}

/** Writes a new bin and its opening stock, and answers the bin as written. */
export function insertNewBin(ctx: ServiceContext, actor: UserRow, input: CreateBinInput): BinRow {
  return ctx.db.$client
    .transaction(() => {
      const code = input.code ?? nextBinCode(ctx.db);
      if (findBinByCode(ctx.db, code)) throw codeTaken(code);
      writeNewBins(ctx, actor, [{ ...newBinRow(input, ctx.now()), code }]);
      return findBinByCode(ctx.db, code)!;
    })
    .immediate();
}

/** A new bin as it is written: stock on hand is its opening stock. The code is set before writing. */
export function newBinRow(input: CreateBinInput, at: Date): NewBinRow {
  return { ...(rowValues(input) as NewBinRow), code: input.code ?? '', name: input.name, createdAt: at, updatedAt: at, onHand: input.initialQuantity };
}

/**
 * Writes new bins (rows from `newBinRow`, codes set) inside the caller's transaction: each one's
 * opening stock is its first ledger entry, so on hand is the ledger's sum from the start.
 */
export function writeNewBins(ctx: ServiceContext, actor: UserRow, rows: readonly NewBinRow[]): void {
  const ids = insertBins(ctx.db, rows);
  insertMovements(
    ctx.db,
    rows.flatMap((bin, i) => {
      const quantity = bin.onHand ?? 0;
      const at = bin.createdAt ?? ctx.now();
      return quantity > 0 ? [{ binId: ids[i]!, kind: 'receive' as const, quantity, balanceAfter: quantity, unitCostE4: bin.unitCostE4 ?? 0, at, actorId: actor.id, note: 'Opening stock' }] : [];
    }),
  );
}

/** What an update of a bin's descriptive fields writes (on hand is never among them). */
export function binFieldsRow(fields: Partial<CreateBinInput>, at: Date): Partial<NewBinRow> {
  return { ...rowValues(fields), updatedAt: at };
}

/** Writes many bins' changed fields (rows from `binFieldsRow`), inside the caller's transaction. */
export function writeBinFields(ctx: ServiceContext, changes: readonly { id: number; set: Partial<NewBinRow> }[]): void {
  updateBins(ctx.db, changes);
}

/** Changes the fields sent; on hand changes only through the ledger. The result must still be a valid bin of its kind. */
export function editBin(ctx: ServiceContext, code: string, change: UpdateBinBody): Bin {
  const bin = binOrThrow(ctx.db, code);
  const values = rowValues(change);
  const edited = { ...bin, ...values, ...gripRangeAfterEdit(bin, change) };
  parseInput(wholeBin, edited);
  const { gripMin, gripMax } = withGripRange(edited);
  updateBin(ctx.db, bin.id, { ...values, gripMin, gripMax, updatedAt: ctx.now() });
  return getBin(ctx, code);
}

/** An edited bin must still be a valid bin of its kind (a rivet keeps its spec, a screw its name). */
const wholeBin = z.looseObject({}).superRefine((b, ctx) => binKindRules(b, ctx));

/** The quartermaster's Restock list: what the one reorder rule orders now, in whole packs, by supplier. */
export function restockList(ctx: ServiceContext): RestockItem[] {
  const reorders = binReorders(ctx);
  const rows = allBinsBySupplier(ctx.db).filter((b) => (reorders.get(b.id)?.toOrder ?? 0) > 0);
  return withCounts(ctx, reorders, rows).map((bin) => ({ ...bin, packsToOrder: bin.toOrder / bin.packSize }));
}
