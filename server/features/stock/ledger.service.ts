import type { CountBody, CountResult, DrawBody, LedgerEntry, MoveBody, Movement, ReceiveBody, ReturnUnusedBody, ReverseBody, WriteOffBody } from '@shared/schemas/bins';
import type { MovementKind } from '@shared/stock/kinds';
import type { ServiceContext } from '../../context';
import type { Database, Executor } from '../../db/client';
import type { BinRow, MovementRow } from '../../db/schema/stock';
import type { UserRow } from '../../db/schema/users';
import { hasRole } from '@shared/roles';
import { HttpError } from '../../lib/http-error';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { findBinByCode, findBinById, sameSpecBins, updateBin } from './bins.repo';
import { findMovement, findPairedWith, findReversalOf, insertMovement, listMovements, netDrawnBy, setOnHand, type LedgerRow } from './ledger.repo';
import { assemblyOwnerId } from '../planning/planning.reads';
import { dollarsToE4, e4ToDollars, valueCents } from '@shared/stock/money';
import { slipExists } from './slips.repo';
import { withAssemblyNames } from './assembly-names';
import { publish } from '../../events/domain-events';

export function binOrThrow(db: Database, code: string): BinRow {
  const bin = findBinByCode(db, code);
  if (!bin) throw new HttpError(404, 'BIN_NOT_FOUND', `No bin has the code ${code}. Check the label, or type the code.`);
  return bin;
}

const insufficient = (bin: BinRow, wanted: number, what: string) =>
  new HttpError(409, 'INSUFFICIENT_STOCK', `Cannot ${what} ${wanted} from ${bin.code}: only ${bin.onHand} on hand.`);

interface Entry {
  kind: MovementKind;
  quantity: number;
  actor: UserRow;
  /** When it happened; when it reached the server, if later (a draw or return queued offline). */
  at: Date;
  arrivedAt?: Date;
  unitCostE4?: number;
  memberId?: number | null;
  assemblyId?: number | null;
  note?: string;
  reversesId?: number;
  pairedId?: number;
  slipId?: number;
}

/**
 * The one way stock changes: appends an entry and moves the bin's balance with it, in the caller's
 * transaction. A change that would leave the bin below zero is refused before anything is written.
 */
function post(ctx: ServiceContext, bin: BinRow, e: Entry, refusal: string): MovementRow {
  const db = ctx.db;
  const balanceAfter = bin.onHand + e.quantity;
  if (balanceAfter < 0) throw insufficient(bin, -e.quantity, refusal);
  const row = insertMovement(db, {
    binId: bin.id,
    kind: e.kind,
    quantity: e.quantity,
    balanceAfter,
    unitCostE4: e.unitCostE4 ?? bin.unitCostE4,
    at: e.at,
    arrivedAt: e.arrivedAt ?? e.at,
    actorId: e.actor.id,
    // The crib station the person acted at, if any.
    stationId: ctx.station?.id ?? null,
    memberId: e.memberId ?? null,
    assemblyId: e.assemblyId ?? null,
    note: e.note ?? '',
    reversesId: e.reversesId ?? null,
    pairedId: e.pairedId ?? null,
    slipId: e.slipId ?? null,
  });
  setOnHand(db, bin.id, balanceAfter, e.arrivedAt ?? e.at);
  bin.onHand = balanceAfter;
  return row;
}

/** Runs a ledger change as one immediate transaction: the balance read and the write cannot interleave. */
function inTransaction<T>(ctx: ServiceContext, work: () => T): T {
  return ctx.db.$client.transaction(work).immediate();
}

export function movementDto(r: LedgerRow): Movement {
  const m = r.m;
  return {
    id: m.id,
    binCode: r.binCode,
    at: m.at.toISOString(),
    arrivedAt: (m.arrivedAt ?? m.at).toISOString(),
    kind: m.kind,
    quantity: m.quantity,
    balanceAfter: m.balanceAfter,
    unitCost: e4ToDollars(m.unitCostE4),
    valueCents: valueCents(m.quantity, m.unitCostE4),
    actor: { id: m.actorId, name: r.actorName },
    member: m.memberId !== null ? { id: m.memberId, name: r.memberName ?? '' } : null,
    assemblyId: m.assemblyId,
    note: m.note,
    reversesId: m.reversesId,
    reversedById: r.reversedById,
    otherBinCode: r.otherBinCode,
    slipId: m.slipId,
    station: r.stationName,
  };
}

function loadMovement(ctx: ServiceContext, id: number): Movement {
  const row = listMovements(ctx.db, { id })[0];
  if (!row) throw new HttpError(404, 'ENTRY_NOT_FOUND', `There is no ledger entry ${id}.`);
  return movementDto(row);
}

/** A draw or return names only the member's own assembly, so each assembly's actual use is its owner's. */
function checkOwnAssembly(db: Executor, actor: UserRow, assemblyId: number | null | undefined): void {
  if (assemblyId === null || assemblyId === undefined || assemblyOwnerId(db, assemblyId) === actor.id) return;
  throw new HttpError(400, 'ASSEMBLY_NOT_YOURS', `Assembly ${assemblyId} is not one of your assemblies. Choose one of your own, or leave the assembly out.`, [
    { path: 'assemblyId', message: 'Choose one of your own assemblies.' },
  ]);
}

/** When a member's draw or return happened (`performedAt`, queued offline) and when it arrived. */
const memberTimes = (ctx: ServiceContext, performedAt?: Date) => {
  const arrivedAt = ctx.now();
  return { at: performedAt ?? arrivedAt, arrivedAt };
};

/**
 * A member takes stock for their work; it goes on their tab at today's unit cost. A draw queued
 * offline is dated when it was done; the bin's balance moves when it arrives.
 */
export function draw(ctx: ServiceContext, actor: UserRow, code: string, body: DrawBody, performedAt?: Date): Movement {
  const id = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    checkOwnAssembly(ctx.db, actor, body.assemblyId);
    const times = memberTimes(ctx, performedAt);
    return post(ctx, bin, { kind: 'draw', quantity: -body.quantity, actor, ...times, memberId: actor.id, assemblyId: body.assemblyId, note: body.note }, 'draw').id;
  });
  return loadMovement(ctx, id);
}

/** Unused stock goes back in the bin and off the member's tab; at most what they drew from it. */
export function returnUnused(ctx: ServiceContext, actor: UserRow, code: string, body: ReturnUnusedBody, performedAt?: Date): Movement {
  const id = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    checkOwnAssembly(ctx.db, actor, body.assemblyId);
    const drawn = netDrawnBy(ctx.db, bin.id, actor.id);
    if (body.quantity > drawn) {
      throw new HttpError(409, 'RETURN_EXCEEDS_DRAWN', `You can return at most ${drawn} to ${bin.code}: that is what you drew from it and have not returned.`);
    }
    const times = memberTimes(ctx, performedAt);
    return post(ctx, bin, { kind: 'return_unused', quantity: body.quantity, actor, ...times, memberId: actor.id, assemblyId: body.assemblyId, note: body.note }, 'return').id;
  });
  return loadMovement(ctx, id);
}

/**
 * The quartermaster books an order in; a new unit cost becomes the bin's cost from now on. Publishes
 * `stock.received` in the same transaction (planning's reorder alerts count it).
 */
export function receive(ctx: ServiceContext, actor: UserRow, code: string, body: ReceiveBody): Movement {
  const id = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    if (body.slipId !== undefined && !slipExists(ctx.db, body.slipId)) {
      throw new HttpError(400, 'SLIP_NOT_FOUND', `There is no packing slip ${body.slipId}. Upload it again.`, [{ path: 'slipId', message: 'Upload the packing slip again.' }]);
    }
    const at = ctx.now();
    const unitCostE4 = body.unitCost !== undefined ? dollarsToE4(body.unitCost) : bin.unitCostE4;
    if (unitCostE4 !== bin.unitCostE4) Object.assign(bin, updateBin(ctx.db, bin.id, { unitCostE4, updatedAt: at }));
    const row = post(ctx, bin, { kind: 'receive', quantity: body.quantity, actor, at, unitCostE4, note: body.note, slipId: body.slipId }, 'receive');
    publish(ctx, { type: 'stock.received', binId: bin.id, quantity: body.quantity, movementId: row.id, at });
    return row.id;
  });
  return loadMovement(ctx, id);
}

/** A count sets the bin to what is really there; the entry records the adjustment (possibly 0). */
export function count(ctx: ServiceContext, actor: UserRow, code: string, body: CountBody): CountResult {
  const result = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    const before = bin.onHand;
    const variance = body.counted - before;
    const row = post(ctx, bin, { kind: 'count', quantity: variance, actor, at: ctx.now(), note: body.note }, 'count');
    return { id: row.id, before, variance, unitCostE4: row.unitCostE4 };
  });
  return {
    ...loadMovement(ctx, result.id),
    counted: body.counted,
    onHandBefore: result.before,
    variance: result.variance,
    varianceValueCents: valueCents(result.variance, result.unitCostE4),
  };
}

/** Moves stock to another bin of the same spec: one entry out, one in, at the source's unit cost. */
export function move(ctx: ServiceContext, actor: UserRow, code: string, body: MoveBody): Movement {
  const id = inTransaction(ctx, () => {
    const from = binOrThrow(ctx.db, code);
    if (body.to === from.code) throw new HttpError(400, 'SAME_BIN', 'Choose another bin to move the stock to.', [{ path: 'to', message: 'Choose another bin.' }]);
    const to = binOrThrow(ctx.db, body.to);
    if (!sameSpecBins(ctx.db, from).some((b) => b.id === to.id)) {
      throw new HttpError(409, 'NOT_SAME_SPEC', `${to.code} does not hold the same thing as ${from.code}: stock moves only between bins of the same spec.`);
    }
    const at = ctx.now();
    const note = body.note ?? '';
    const out = post(ctx, from, { kind: 'transfer_out', quantity: -body.quantity, actor, at, note }, 'move');
    post(ctx, to, { kind: 'transfer_in', quantity: body.quantity, actor, at, note, unitCostE4: from.unitCostE4, pairedId: out.id }, 'move');
    return out.id;
  });
  return loadMovement(ctx, id);
}

/** Damaged, spilt, out of date: stock leaves the bin with a reason. */
export function writeOff(ctx: ServiceContext, actor: UserRow, code: string, body: WriteOffBody): Movement {
  const id = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    return post(ctx, bin, { kind: 'write_off', quantity: -body.quantity, actor, at: ctx.now(), note: body.note }, 'write off').id;
  });
  return loadMovement(ctx, id);
}

/**
 * Undoes an entry by appending its opposite, which names it; an entry is reversed at most once,
 * and a reversal is itself not reversed (enter the movement again instead). A transfer is
 * reversed on both bins together.
 */
export function reverse(ctx: ServiceContext, actor: UserRow, code: string, entryId: number, body: ReverseBody): Movement {
  const id = inTransaction(ctx, () => {
    const bin = binOrThrow(ctx.db, code);
    const entry = findMovement(ctx.db, entryId);
    if (!entry || entry.binId !== bin.id) throw new HttpError(404, 'ENTRY_NOT_FOUND', `${bin.code} has no ledger entry ${entryId}.`);
    if (entry.kind === 'reversal') throw new HttpError(409, 'CANNOT_REVERSE_REVERSAL', 'This entry is itself a reversal. Enter the movement again instead.');
    if (entry.kind === 'count' && entry.quantity === 0) throw new HttpError(409, 'NOTHING_TO_REVERSE', 'This count changed nothing, so there is nothing to reverse.');
    const at = ctx.now();
    const undo = (target: MovementRow, targetBin: BinRow) => {
      if (findReversalOf(ctx.db, target.id)) throw new HttpError(409, 'ALREADY_REVERSED', `Entry ${target.id} has already been reversed.`);
      checkNoReturnAgainst(ctx.db, target);
      return post(
        ctx,
        targetBin,
        { kind: 'reversal', quantity: -target.quantity, actor, at, unitCostE4: target.unitCostE4, memberId: target.memberId, assemblyId: target.assemblyId, note: body.note, reversesId: target.id },
        'reverse',
      );
    };
    try {
      const first = undo(entry, bin);
      const partner = pairedEntry(ctx.db, entry);
      if (partner) undo(partner, binById(ctx.db, partner.binId));
      return first.id;
    } catch (err) {
      if (isUniqueViolation(err)) throw new HttpError(409, 'ALREADY_REVERSED', `Entry ${entryId} has already been reversed.`);
      throw err;
    }
  });
  return loadMovement(ctx, id);
}

/**
 * Returns are kept per member per bin, not against one draw. The rule: a draw may be reversed only
 * while the member's net drawn on that bin (draws less returns, net of reversals) stays at or above
 * zero after the reversal. Otherwise part of this draw has already come back, and reversing it would
 * put stock in the bin that never existed and leave the member's tab below nothing: the return
 * must be reversed first. A return's own reversal only adds to what the member has drawn, so it is
 * limited by on hand alone (post() checks that).
 */
function checkNoReturnAgainst(db: Database, entry: MovementRow): void {
  if (entry.kind !== 'draw' || entry.memberId === null) return;
  const taken = -entry.quantity;
  const returnedAgainst = taken - netDrawnBy(db, entry.binId, entry.memberId);
  if (returnedAgainst <= 0) return;
  const were = returnedAgainst === 1 ? 'was' : 'were';
  throw new HttpError(409, 'RETURN_AGAINST_DRAW', `${returnedAgainst} of this draw ${were} returned; reverse that return first.`);
}

function pairedEntry(db: Executor, entry: MovementRow): MovementRow | undefined {
  if (entry.kind === 'transfer_in' && entry.pairedId !== null) return findMovement(db, entry.pairedId);
  if (entry.kind === 'transfer_out') return findPairedWith(db, entry.id);
  return undefined;
}

function binById(db: Executor, id: number): BinRow {
  const bin = findBinById(db, id);
  if (!bin) throw new HttpError(404, 'BIN_NOT_FOUND', `Bin ${id} no longer exists.`);
  return bin;
}

/** A member's own entry: on their tab (member), or one they made that is on no one's tab. */
const isOwnEntry = (m: Movement, viewer: UserRow) => (m.member ? m.member.id === viewer.id : m.actor.id === viewer.id);

/** Another person's entry as a member sees it: what moved and when, not who, what for or what it cost. */
function masked(m: Movement): LedgerEntry {
  return { ...m, masked: true, actor: null, member: null, unitCost: null, valueCents: null, assemblyId: null, assembly: null, note: '' };
}

/** A bin's ledger, newest first; a member sees others' entries masked (see ledgerEntrySchema). */
export function ledgerFor(ctx: ServiceContext, viewer: UserRow, code: string, from?: Date, to?: Date, limit?: number): LedgerEntry[] {
  const bin = binOrThrow(ctx.db, code);
  const entries = listMovements(ctx.db, { binId: bin.id, from, to, limit }).map(movementDto);
  const seesAll = hasRole(viewer.role, 'quartermaster');
  const shown = seesAll ? entries : entries.filter((m) => isOwnEntry(m, viewer));
  const names = withAssemblyNames(ctx.db, shown);
  const full = new Map(names.map((e) => [e.id, { ...e, masked: false }]));
  return entries.map((m) => full.get(m.id) ?? masked(m));
}
