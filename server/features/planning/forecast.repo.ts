import { and, asc, eq, gte, inArray, lt, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { AssemblyStatus } from '@shared/schemas/builds';
import type { Executor } from '../../db/client';
import { assemblies, binAlerts, builds } from '../../db/schema/builds';
import { bins, stockMovements, type BinRow } from '../../db/schema/stock';
import { users } from '../../db/schema/users';

export function allBins(db: Executor): BinRow[] {
  return db.select().from(bins).orderBy(asc(bins.code)).all();
}

const CONSUMING: ('draw' | 'return_unused')[] = ['draw', 'return_unused'];
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

export interface AssemblyForPlanning {
  id: number;
  ownerId: number;
  ownerName: string;
  status: AssemblyStatus;
  plannedStart: Date | null;
  plannedFinish: Date | null;
  unit: 'in' | 'mm';
  lines: string;
  extraItems: string;
  edgeFloorIn: number | null;
}

export function assembliesIn(db: Executor, statuses: AssemblyStatus[]): AssemblyForPlanning[] {
  return db
    .select({
      id: assemblies.id,
      ownerId: builds.ownerId,
      ownerName: users.name,
      status: assemblies.status,
      plannedStart: assemblies.plannedStart,
      plannedFinish: assemblies.plannedFinish,
      unit: assemblies.unit,
      lines: assemblies.lines,
      extraItems: assemblies.extraItems,
      edgeFloorIn: builds.edgeFloorIn,
    })
    .from(assemblies)
    .innerJoin(builds, eq(builds.id, assemblies.buildId))
    .innerJoin(users, eq(users.id, builds.ownerId))
    .where(inArray(assemblies.status, statuses))
    .orderBy(asc(assemblies.id))
    .all();
}

/** Units drawn for each assembly of these statuses from each bin, net of returns and reversals; keyed `assemblyId:binId`. */
export function drawnForAssemblies(db: Executor, statuses: AssemblyStatus[]): Map<string, number> {
  const rows = db
    .select({ assemblyId: stockMovements.assemblyId, binId: stockMovements.binId, n: sql<number>`-sum(${stockMovements.quantity})` })
    .from(stockMovements)
    .where(
      and(
        inArray(stockMovements.assemblyId, db.select({ id: assemblies.id }).from(assemblies).where(inArray(assemblies.status, statuses))),
        inArray(stockMovements.kind, [...CONSUMING, 'reversal']),
      ),
    )
    .groupBy(stockMovements.assemblyId, stockMovements.binId)
    .all();
  return new Map(rows.map((r) => [`${r.assemblyId}:${r.binId}`, r.n]));
}

/** Orders placed on alerts and not yet received (the rest of a partly received one): the expected receipts. */
export function orderedAlerts(db: Executor): { binId: number; quantity: number; expectedAt: Date }[] {
  return db
    .select({ binId: binAlerts.binId, quantity: sql<number>`max(0, ${binAlerts.orderedQty} - ${binAlerts.receivedQty})`, expectedAt: sql<number>`${binAlerts.expectedAt}` })
    .from(binAlerts)
    .where(eq(binAlerts.state, 'ordered'))
    .all()
    .map((r) => ({ binId: r.binId, quantity: r.quantity, expectedAt: new Date(r.expectedAt) }));
}
