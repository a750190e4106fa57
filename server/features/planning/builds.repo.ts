import { asc, eq, inArray } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { assemblies, builds, type BuildRow } from '../../db/schema/builds';
import { users } from '../../db/schema/users';

export type NewBuildRow = typeof builds.$inferInsert;

/** A build with its owner's name. */
export interface BuildWithOwner {
  build: BuildRow;
  ownerName: string;
}

const withOwner = { build: builds, ownerName: users.name };

export function insertBuild(db: Executor, values: NewBuildRow): BuildRow {
  return db.insert(builds).values(values).returning().get();
}

export function updateBuildRow(db: Executor, id: number, values: Partial<NewBuildRow>): BuildRow {
  return db.update(builds).set(values).where(eq(builds.id, id)).returning().get();
}

export function findBuild(db: Executor, id: number): BuildWithOwner | undefined {
  return db.select(withOwner).from(builds).innerJoin(users, eq(users.id, builds.ownerId)).where(eq(builds.id, id)).get();
}

/** Builds by name, one owner's or everyone's. */
export function listBuilds(db: Executor, ownerId?: number): BuildWithOwner[] {
  return db
    .select(withOwner)
    .from(builds)
    .innerJoin(users, eq(users.id, builds.ownerId))
    .where(ownerId === undefined ? undefined : eq(builds.ownerId, ownerId))
    .orderBy(asc(builds.name), asc(builds.id))
    .all();
}

export type AssemblySummaryRow = Pick<typeof assemblies.$inferSelect, 'id' | 'buildId' | 'name' | 'status' | 'plannedStart' | 'plannedFinish'>;

/** The assemblies of some builds, in planned order (undated last). */
export function assemblySummaries(db: Executor, buildIds: number[]): AssemblySummaryRow[] {
  if (buildIds.length === 0) return [];
  return db
    .select({ id: assemblies.id, buildId: assemblies.buildId, name: assemblies.name, status: assemblies.status, plannedStart: assemblies.plannedStart, plannedFinish: assemblies.plannedFinish })
    .from(assemblies)
    .where(inArray(assemblies.buildId, buildIds))
    .orderBy(asc(assemblies.plannedStart), asc(assemblies.id))
    .all()
    .sort(undatedLast);
}

/** SQLite sorts nulls first; people expect undated assemblies after the planned ones. */
export const undatedLast = (a: { plannedStart: Date | null }, b: { plannedStart: Date | null }) => Number(a.plannedStart === null) - Number(b.plannedStart === null);
