import type { Database } from '../../server/db/client';
import { assemblies, builds } from '../../server/db/schema/builds';

/**
 * Gives a member assemblies with these exact ids (in one build of theirs), for tests whose draws
 * name an assembly: a draw may name only the drawing member's own assembly.
 */
export function giveAssemblies(db: Database, ownerId: number, ids: number[], named: { build?: string; assemblies?: Record<number, string> } = {}): void {
  const build = db.insert(builds).values({ ownerId, name: named.build ?? 'Test build' }).returning().get();
  for (const id of ids) db.insert(assemblies).values({ id, buildId: build.id, name: named.assemblies?.[id] ?? `Assembly ${id}` }).run();
}
