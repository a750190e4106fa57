import { asc, eq, inArray, sql } from 'drizzle-orm';
import type { AssemblyStatus } from '@shared/schemas/builds';
import type { Executor } from '../../db/client';
import { assemblies, binAlerts, builds } from '../../db/schema/builds';
import { users } from '../../db/schema/users';

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

/** Orders placed on alerts and not yet received (the rest of a partly received one): the expected receipts. */
export function orderedAlerts(db: Executor): { binId: number; quantity: number; expectedAt: Date }[] {
  return db
    .select({ binId: binAlerts.binId, quantity: sql<number>`max(0, ${binAlerts.orderedQty} - ${binAlerts.receivedQty})`, expectedAt: sql<number>`${binAlerts.expectedAt}` })
    .from(binAlerts)
    .where(eq(binAlerts.state, 'ordered'))
    .all()
    .map((r) => ({ binId: r.binId, quantity: r.quantity, expectedAt: new Date(r.expectedAt) }));
}
