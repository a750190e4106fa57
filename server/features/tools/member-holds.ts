import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { holds, tools } from '../../db/schema/tools';
import { queuePosition } from './tools.repo';

export interface HoldOfPerson {
  tool: { code: string; name: string };
  status: 'waiting' | 'offered';
  /** The place in the tool's queue, by the crib's own count (1 is first in line). */
  position: number;
  offerExpiresAt: Date | null;
  startsAt: Date | null;
}

/** A person's active holds: tools set aside for them and their queue places, oldest first. */
export function activeHoldsOf(db: Database, userId: number): HoldOfPerson[] {
  return db
    .select({ hold: holds, code: tools.code, name: tools.name })
    .from(holds)
    .innerJoin(tools, eq(tools.id, holds.toolId))
    .where(and(eq(holds.userId, userId), inArray(holds.status, ['waiting', 'offered'])))
    .orderBy(asc(holds.createdAt), asc(holds.id))
    .all()
    .map(({ hold, code, name }) => ({
      tool: { code, name },
      status: hold.status as 'waiting' | 'offered',
      position: queuePosition(db, hold.toolId, hold.id),
      offerExpiresAt: hold.offerExpiresAt,
      startsAt: hold.startsAt,
    }));
}
