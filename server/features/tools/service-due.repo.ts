import { and, isNotNull, notInArray, or, eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { tools } from '../../db/schema/tools';
import type { ToolRow } from './tools.repo';

/** Tools still in the crib that are out of service or have a service interval. */
export function listServiceCandidates(db: Executor): ToolRow[] {
  return db
    .select()
    .from(tools)
    .where(and(notInArray(tools.status, ['lost', 'retired']), or(eq(tools.status, 'out_of_service'), isNotNull(tools.serviceIntervalDays))))
    .all();
}
