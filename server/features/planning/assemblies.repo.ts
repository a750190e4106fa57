import { and, asc, eq, inArray, type SQL } from 'drizzle-orm';
import type { AssemblyStatus } from '@shared/schemas/builds';
import type { Executor } from '../../db/client';
import { assemblies, builds, type AssemblyRow, type BuildRow } from '../../db/schema/builds';
import { users } from '../../db/schema/users';
import { undatedLast } from './builds.repo';

export type NewAssemblyRow = typeof assemblies.$inferInsert;

/** An assembly with the build it belongs to and the build's owner. */
export interface AssemblyInBuild {
  assembly: AssemblyRow;
  build: BuildRow;
  ownerName: string;
}

const joined = (db: Executor, where: SQL | undefined) =>
  db
    .select({ assembly: assemblies, build: builds, ownerName: users.name })
    .from(assemblies)
    .innerJoin(builds, eq(builds.id, assemblies.buildId))
    .innerJoin(users, eq(users.id, builds.ownerId))
    .where(where);

export function insertAssembly(db: Executor, values: NewAssemblyRow): AssemblyRow {
  return db.insert(assemblies).values(values).returning().get();
}

export function updateAssemblyRow(db: Executor, id: number, values: Partial<NewAssemblyRow>): AssemblyRow {
  return db.update(assemblies).set(values).where(eq(assemblies.id, id)).returning().get();
}

export function deleteAssemblyRow(db: Executor, id: number): void {
  db.delete(assemblies).where(eq(assemblies.id, id)).run();
}

export function findAssembly(db: Executor, id: number): AssemblyInBuild | undefined {
  return joined(db, eq(assemblies.id, id)).get();
}

export function listAssemblies(db: Executor, f: { ownerId?: number; ownerIds?: readonly number[]; status?: AssemblyStatus }): AssemblyInBuild[] {
  const where = and(
    f.ownerId === undefined ? undefined : eq(builds.ownerId, f.ownerId),
    f.ownerIds === undefined ? undefined : inArray(builds.ownerId, [...f.ownerIds]),
    f.status ? eq(assemblies.status, f.status) : undefined,
  );
  return joined(db, where)
    .orderBy(asc(assemblies.plannedStart), asc(assemblies.id))
    .all()
    .sort((a, b) => undatedLast(a.assembly, b.assembly));
}

/** The assemblies with these ids and their builds' names (ids that name nothing are left out). */
export function assemblyAndBuildNames(db: Executor, ids: readonly number[]): { id: number; name: string; buildName: string }[] {
  if (ids.length === 0) return [];
  return db
    .select({ id: assemblies.id, name: assemblies.name, buildName: builds.name })
    .from(assemblies)
    .innerJoin(builds, eq(builds.id, assemblies.buildId))
    .where(inArray(assemblies.id, [...ids]))
    .all();
}
