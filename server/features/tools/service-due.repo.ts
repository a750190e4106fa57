import { and, eq, exists, isNotNull, isNull, notInArray, or } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { missingAccessories, tools } from '../../db/schema/tools';
import type { ToolRow } from './tools.repo';

/** Tools still in the crib that are out of service, have a service interval, or miss an accessory. */
export function listServiceCandidates(db: Executor): ToolRow[] {
  const missesOne = exists(
    db
      .select({ id: missingAccessories.id })
      .from(missingAccessories)
      .where(and(eq(missingAccessories.toolId, tools.id), isNull(missingAccessories.resolvedAt))),
  );
  return db
    .select()
    .from(tools)
    .where(and(notInArray(tools.status, ['lost', 'retired']), or(eq(tools.status, 'out_of_service'), isNotNull(tools.serviceIntervalDays), missesOne)))
    .all();
}
