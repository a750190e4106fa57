import { and, eq, gte, isNull, lt, max, notInArray, or } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { loans, tools } from '../../db/schema/tools';

export interface StatsLoanRow {
  tool: { code: string; name: string; category: (typeof tools.$inferSelect)['category'] };
  checkedOutAt: Date;
  dueAt: Date;
  returnedAt: Date | null;
}

/** Loans that touch the window from `from`: taken out since, still out, or back since (so late days inside it count). */
export function loansTouching(db: Executor, from: Date): StatsLoanRow[] {
  return db
    .select({
      tool: { code: tools.code, name: tools.name, category: tools.category },
      checkedOutAt: loans.checkedOutAt,
      dueAt: loans.dueAt,
      returnedAt: loans.returnedAt,
    })
    .from(loans)
    .innerJoin(tools, eq(tools.id, loans.toolId))
    .where(or(gte(loans.checkedOutAt, from), isNull(loans.returnedAt), gte(loans.returnedAt, from)))
    .all();
}

/** Tools still on the crib's books (not lost or retired) with no checkout since `since`, and that joined the crib before it. */
export function toolsUnlentSince(db: Executor, since: Date) {
  const lastLentAt = max(loans.checkedOutAt);
  return db
    .select({ code: tools.code, name: tools.name, category: tools.category, status: tools.status, addedAt: tools.createdAt, lastLentAt })
    .from(tools)
    .leftJoin(loans, eq(loans.toolId, tools.id))
    .where(and(notInArray(tools.status, ['lost', 'retired']), lt(tools.createdAt, since)))
    .groupBy(tools.id)
    // An aggregate is no column, so the moment is bound as the stored milliseconds.
    .having(or(isNull(lastLentAt), lt(lastLentAt, since.getTime())))
    .all();
}
