/**
 * Planning's read models: what other features may read of the tables planning owns (builds,
 * assemblies, bin_alerts). Another feature imports this file and nothing else of planning.
 */
import { eq } from 'drizzle-orm';
import type { AssemblyName, BinReorder } from '@shared/schemas/bins';
import type { Catalogue } from '@shared/schemas/offline';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import { assemblies, builds } from '../../db/schema/builds';
import { assemblyAndBuildNames, listAssemblies } from './assemblies.repo';
import { reorderPlan } from './reorder-plan';

// for stock

/** Who owns the build an assembly belongs to; undefined when there is no such assembly. */
export function assemblyOwnerId(db: Executor, assemblyId: number): number | undefined {
  return db.select({ ownerId: builds.ownerId }).from(assemblies).innerJoin(builds, eq(builds.id, assemblies.buildId)).where(eq(assemblies.id, assemblyId)).get()?.ownerId;
}

/** The names of these assemblies and their builds, by id (the ledger and tabs name the assembly a draw was for); ids that name no assembly are absent. */
export function assemblyNames(db: Executor, ids: readonly number[]): Map<number, AssemblyName> {
  return new Map(assemblyAndBuildNames(db, [...new Set(ids)]).map((a) => [a.id, { name: a.name, buildName: a.buildName }]));
}

/** What stock shows on each bin of the one reorder computation (reorder-plan.ts), by bin id. */
export function binReorders(ctx: ServiceContext): Map<number, BinReorder> {
  const orders = reorderPlan(ctx).orders;
  return new Map([...orders].map(([id, o]) => [id, { low: o.low, toOrder: o.toOrder, onOrder: o.onOrder, reorderAt: o.reorderAt, orderCostCents: o.orderCostCents }]));
}

// for offline

/** The assemblies a member may draw for: their own, not done. */
export function openAssembliesOf(db: Executor, ownerId: number): Catalogue['yourAssemblies'] {
  return openAssembliesByOwner(db, [ownerId]).get(ownerId) ?? [];
}

/** openAssembliesOf for each of these people, by person, in one query; someone with none is absent. */
export function openAssembliesByOwner(db: Executor, ownerIds: readonly number[]): Map<number, Catalogue['yourAssemblies']> {
  const byOwner = new Map<number, Catalogue['yourAssemblies']>();
  if (ownerIds.length === 0) return byOwner;
  for (const a of listAssemblies(db, { ownerIds })) {
    if (a.assembly.status === 'done') continue;
    const open = { id: a.assembly.id, name: a.assembly.name, buildName: a.build.name };
    const list = byOwner.get(a.build.ownerId);
    if (list) list.push(open);
    else byOwner.set(a.build.ownerId, [open]);
  }
  return byOwner;
}
