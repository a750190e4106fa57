/**
 * Planning's read models: what other features may read of the tables planning owns (builds,
 * assemblies, bin_alerts). Another feature imports this file and nothing else of planning.
 */
import { eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { assemblies, builds } from '../../db/schema/builds';

// for stock

/** Who owns the build an assembly belongs to; undefined when there is no such assembly. */
export function assemblyOwnerId(db: Executor, assemblyId: number): number | undefined {
  return db.select({ ownerId: builds.ownerId }).from(assemblies).innerJoin(builds, eq(builds.id, assemblies.buildId)).where(eq(assemblies.id, assemblyId)).get()?.ownerId;
}
