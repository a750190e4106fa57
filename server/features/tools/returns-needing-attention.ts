import { and, desc, eq, isNotNull } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { loans, toolEvents, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export interface ReturnNeedingAttention {
  code: string;
  name: string;
  note: string;
  returnedBy: string;
  returnedAt: Date;
}

/**
 * Tools out of service because they came back "needs attention" (the move into out of service was
 * a return, not the quartermaster's own), with the last loan's holder, time and note. A read only.
 */
export function listReturnsNeedingAttention(db: Executor): ReturnNeedingAttention[] {
  const outOfService = db.select().from(tools).where(eq(tools.status, 'out_of_service')).orderBy(tools.code).all();
  return outOfService.flatMap((tool) => {
    const cause = db
      .select({ action: toolEvents.action })
      .from(toolEvents)
      .where(and(eq(toolEvents.toolId, tool.id), eq(toolEvents.toStatus, 'out_of_service')))
      .orderBy(desc(toolEvents.at), desc(toolEvents.id))
      .get();
    if (cause?.action !== 'returned') return [];
    const loan = db
      .select({ returnedAt: loans.returnedAt, note: loans.returnNote, holder: users.name })
      .from(loans)
      .innerJoin(users, eq(users.id, loans.userId))
      .where(and(eq(loans.toolId, tool.id), isNotNull(loans.returnedAt)))
      .orderBy(desc(loans.returnedAt), desc(loans.id))
      .get();
    if (!loan?.returnedAt) return [];
    return [{ code: tool.code, name: tool.name, note: loan.note ?? tool.statusNote ?? '', returnedBy: loan.holder, returnedAt: loan.returnedAt }];
  });
}
